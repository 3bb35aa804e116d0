import { parseJsonBody } from '@/app/lib/api';
import { requireUser } from '@/app/lib/authz';
import { guarded } from '@/app/lib/route-handler';
import { createShop } from '@/app/lib/workspace-service';
import { workspacesOf } from '@/db/accounts';
import { createShopSchema } from '@/lib/account-forms';

/** GET: the signed-in user's workspaces with their role in each. */
export async function GET() {
  return guarded(async () => {
    const user = await requireUser();
    return Response.json(await workspacesOf(user.id));
  });
}

/** POST { name }: any signed-in user creates a shop workspace and becomes its owner. */
export async function POST(incoming: Request) {
  return guarded(incoming, {}, async (request) => {
    const user = await requireUser();
    const parsed = await parseJsonBody(request, createShopSchema);
    if (!parsed.ok) return parsed.response;
    return Response.json(await createShop(user.id, parsed.data.name), { status: 201 });
  });
}
