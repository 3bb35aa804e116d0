import { parseJsonBody } from '@/app/lib/api';
import { requireAction } from '@/app/lib/authz';
import { guarded } from '@/app/lib/route-handler';
import { addProfile, profilesOf } from '@/db/printer-profiles';
import { workspacePrinterProfileSchema } from '@/lib/workspace-printer-profile';

type Context = { params: Promise<{ workspace: string }> };

/** GET: the workspace's printer profiles (printer-profile.read: whoever prints needs them). */
export async function GET(_request: Request, { params }: Context) {
  return guarded(async () => {
    const access = await requireAction((await params).workspace, 'printer-profile.read');
    return Response.json(await profilesOf(access.workspace.id));
  });
}

/** POST { name, printerScaleX, printerScaleY }: members who may edit printer profiles save a profile. */
export async function POST(incoming: Request, { params }: Context) {
  return guarded(incoming, {}, async (request) => {
    const access = await requireAction((await params).workspace, 'printer-profile.edit');
    const parsed = await parseJsonBody(request, workspacePrinterProfileSchema);
    if (!parsed.ok) return parsed.response;
    return Response.json(await addProfile(access.workspace.id, access.user.id, parsed.data), { status: 201 });
  });
}
