import 'server-only';
import { defaultProfileOf, profilesOf } from '@/db/printer-profiles';
import { can } from '@/lib/access-policy';
import type { WorkspacePrinterProfiles } from '@/components/generator/download-panel';
import { signedInMember } from './signed-in-member';

/**
 * The printer profiles the sheet maker offers a signed-in member: those of the workspace named by
 * `?workspace=` (links from templates and build records carry it), else of their first shop.
 * Null for a visitor or a workspace they do not belong to.
 */
export async function generatorWorkspaceProfiles(slug: string | undefined): Promise<WorkspacePrinterProfiles | null> {
  const member = await signedInMember();
  if (!member) return null;
  const workspace = (slug ? member.workspaces.find((w) => w.slug === slug) : undefined) ?? member.workspaces.find((w) => w.kind === 'shop');
  if (!workspace || !can(workspace.role, 'printer-profile.read')) return null;
  const [profiles, fallback] = await Promise.all([profilesOf(workspace.id), defaultProfileOf(workspace.id)]);
  return { workspaceName: workspace.name, profiles, defaultId: fallback?.id ?? null };
}
