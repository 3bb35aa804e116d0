import { z } from 'zod';
import { ROLES } from './roles';

/**
 * Schemas of the account and workspace forms: the browser form (react-hook-form) and
 * the route handler validate with the same one. Messages name the field and its limits.
 */

export const PASSWORD_LENGTH = { min: 10, max: 72 } as const; // bcrypt reads at most 72 bytes
export const NAME_LENGTH = { min: 1, max: 120 } as const;
export const SHOP_NAME_LENGTH = { min: 2, max: 80 } as const;

const email = z
  .string({ error: 'E-mail must be text' })
  .trim()
  .max(254, 'E-mail must be at most 254 characters')
  .pipe(z.email({ error: 'E-mail must be an address like name@example.com' }));

const newPassword = z
  .string({ error: `Password must be text, ${PASSWORD_LENGTH.min}–${PASSWORD_LENGTH.max} characters` })
  .min(PASSWORD_LENGTH.min, `Password must be at least ${PASSWORD_LENGTH.min} characters`)
  .refine((value) => new TextEncoder().encode(value).length <= PASSWORD_LENGTH.max, {
    message: `Password must be at most ${PASSWORD_LENGTH.max} bytes (about ${PASSWORD_LENGTH.max} letters)`,
  });

const token = z
  .string({ error: 'Link code is missing: open the link from the e-mail again' })
  .trim()
  .regex(/^[A-Za-z0-9_-]{20,100}$/, 'Link code is not valid: open the link from the e-mail again');

export const signInSchema = z.object({
  email,
  password: z.string({ error: 'Password must be text' }).min(1, 'Password must not be empty').max(200),
});

export const signUpSchema = z.object({
  name: z
    .string({ error: 'Name must be text' })
    .trim()
    .min(NAME_LENGTH.min, 'Name must not be empty')
    .max(NAME_LENGTH.max, `Name must be at most ${NAME_LENGTH.max} characters`),
  email,
  password: newPassword,
  /** An invitation being accepted: proves the mailbox, so the address counts as verified. */
  invitationToken: token.optional(),
});
export type SignUpInput = z.infer<typeof signUpSchema>;

export const emailOnlySchema = z.object({ email });
export const tokenSchema = z.object({ token });
export const resetPasswordSchema = z.object({ token, password: newPassword });

export const createShopSchema = z.object({
  name: z
    .string({ error: 'Shop name must be text' })
    .trim()
    .min(SHOP_NAME_LENGTH.min, `Shop name must be at least ${SHOP_NAME_LENGTH.min} characters`)
    .max(SHOP_NAME_LENGTH.max, `Shop name must be at most ${SHOP_NAME_LENGTH.max} characters`),
});

const role = z.enum(ROLES, { error: `Role must be one of: ${ROLES.join(', ')}` });
export const inviteSchema = z.object({ email, role });
export const roleChangeSchema = z.object({ role });
