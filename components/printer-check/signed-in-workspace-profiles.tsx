import { currentUser } from '@/app/lib/authz';
import { workspacesOf } from '@/db/accounts';
import { can } from '@/lib/access-policy';
import { WorkspaceProfiles } from './workspace-profiles';

/**
 * For the printer check page: nothing for visitors (their profiles stay in the browser);
 * for a signed-in user, the saved profiles of each of their workspaces.
 */
export async function SignedInWorkspaceProfiles() {
  const user = await currentUser();
  if (!user) return null;
  const workspaces = await workspacesOf(user.id);
  return (
    <section aria-labelledby="workspace-profiles-heading" className="space-y-4">
      <h2 id="workspace-profiles-heading" className="text-lg font-semibold">
        Profiles saved in your workspaces
      </h2>
      {workspaces.map((w) => (
        <div key={w.id} className="space-y-2">
          <h3 className="font-medium">{w.name}</h3>
          <WorkspaceProfiles workspaceSlug={w.slug} canEdit={can(w.role, 'printer-profile.edit')} />
        </div>
      ))}
    </section>
  );
}
