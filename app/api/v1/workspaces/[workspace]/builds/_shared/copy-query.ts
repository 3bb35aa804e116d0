import 'server-only';
import { z } from 'zod';

/** `?format=pdf&paper=A4|Letter` of the customer's copy and of its send. */
export const copyQuerySchema = z.object({
  format: z.enum(['pdf'], { error: 'Format (format) must be pdf' }).default('pdf'),
  paper: z.enum(['A4', 'Letter'], { error: 'Paper (paper) must be one of: A4, Letter' }).default('A4'),
});
