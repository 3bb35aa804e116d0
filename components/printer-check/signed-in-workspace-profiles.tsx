import { can } from '@/lib/access-policy';
import type { Role } from '@/lib/roles';
import { WorkspaceProfiles } from './workspace-profiles';

/**
 * For the printer check page: nothing for visitors (their profiles stay in the browser);
 * for a signed-in user, the saved profiles of each of their workspaces.
 */
export function SignedInWorkspaceProfiles({ workspaces }: { workspaces: { id: number; slug: string; name: string; role: Role }[] | null }) {
  if (!workspaces) return null;
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
