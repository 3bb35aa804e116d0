import { z } from 'zod';
import { jsonError, parseJsonBody } from '@/app/lib/api';
import { requireAction } from '@/app/lib/authz';
import { guarded } from '@/app/lib/route-handler';
import { defaultProfileOf, setDefaultProfile } from '@/db/printer-profiles';

type Context = { params: Promise<{ workspace: string }> };

const defaultSchema = z
  .object({
    profileId: z
      .number({ error: 'Default printer profile must be the id of one of this workspace’s profiles, or null for none' })
      .int('Default printer profile must be a whole number')
      .min(1, 'Default printer profile must be a whole number from 1')
      .nullable(),
  })
  .strict();

/** GET: the workspace's default printer profile, or null (printer-profile.read). */
export async function GET(_request: Request, { params }: Context) {
  return guarded(async () => {
    const access = await requireAction((await params).workspace, 'printer-profile.read');
    return Response.json({ profile: await defaultProfileOf(access.workspace.id) });
  });
}

/** PUT { profileId | null }: those allowed printer-profile.set-default choose the profile sheets are corrected with. */
export async function PUT(incoming: Request, { params }: Context) {
  return guarded(incoming, {}, async (request) => {
    const access = await requireAction((await params).workspace, 'printer-profile.set-default');
    const parsed = await parseJsonBody(request, defaultSchema);
    if (!parsed.ok) return parsed.response;
    if (!(await setDefaultProfile(access.workspace.id, parsed.data.profileId)))
      return jsonError(404, 'No such printer profile in this workspace', [{ path: 'profileId', message: 'Choose one of this workspace’s printer profiles' }]);
    return Response.json({ profile: await defaultProfileOf(access.workspace.id) });
  });
}
