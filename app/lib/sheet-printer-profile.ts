import 'server-only';
import { z } from 'zod';
import { defaultProfileOf, findProfile } from '@/db/printer-profiles';

/**
 * `?profile=` of the workspace sheet routes: `default` (the workspace's default profile, when it
 * has one), `none` (no correction), or the id of one of its profiles.
 */
export const profileChoiceSchema = z
  .union([z.enum(['default', 'none']), z.string().regex(/^[1-9]\d{0,9}$/)], {
    error: 'Printer profile must be default, none or the id of one of this workspace’s profiles',
  })
  .default('default');

export type SheetCorrection = { printerScaleX: number; printerScaleY: number; printerProfileName?: string };

const NONE: SheetCorrection = { printerScaleX: 1, printerScaleY: 1 };

/** The printer correction a workspace sheet is drawn with, or null when the chosen id is not the workspace's. */
export async function sheetCorrection(workspaceId: number, choice: string): Promise<SheetCorrection | null> {
  if (choice === 'none') return NONE;
  const profile = choice === 'default' ? await defaultProfileOf(workspaceId) : await findProfile(workspaceId, Number(choice));
  if (!profile) return choice === 'default' ? NONE : null;
  return { printerScaleX: profile.printerScaleX, printerScaleY: profile.printerScaleY, printerProfileName: profile.name };
}
