import type { Metadata } from 'next';
import Link from 'next/link';
import { requestDateFormat } from '@/app/lib/date-format';
import { pageAction } from '@/app/lib/page-access';
import { formatDate } from '@/lib/format/date-format';
import { can } from '@/lib/access-policy';
import { WorkspaceProfiles } from '@/components/printer-check/workspace-profiles';
import { ShopNameForm } from '@/components/workspace/create-shop-form';
import { InviteForm } from '@/components/workspace/invite-form';
import { MembersPanel } from '@/components/workspace/members-panel';
import { PendingInvitations } from '@/components/workspace/pending-invitations';
import { membersOf } from '@/db/accounts';
import { workspaceActivity } from '@/db/activity';
import { ActivityList } from '@/components/workspace/activity-list';
import { ACTIVITY_GROUPS, activityLine, type ActivityGroup } from '@/components/workspace/activity-words';
import { pendingInvitations } from '@/db/invitations';
import { BuildSettingsForm } from '@/components/builds/build-settings-form';
import { workspaceToleranceDeg } from '@/db/builds/references';
import { db } from '@/db/knex';

export const dynamic = 'force-dynamic';
export const metadata: Metadata = { title: 'Workspace' };

type Props = { params: Promise<{ workspace: string }>; searchParams: Promise<{ activity?: string | string[] }> };

function activityGroup(value: string | string[] | undefined): ActivityGroup {
  const first = Array.isArray(value) ? value[0] : value;
  return (ACTIVITY_GROUPS as readonly string[]).includes(first ?? '') ? (first as ActivityGroup) : 'all';
}

export default async function WorkspaceHomePage({ params, searchParams }: Props) {
  const { workspace: slug } = await params;
  const group = activityGroup((await searchParams).activity);
  const access = await pageAction(`/w/${slug}`);
  const { workspace, role, user } = access;
  const may = {
    manageMembers: can(role, 'members.manage'),
    invite: can(role, 'invitations.manage'),
    settings: can(role, 'workspace.settings'),
    audit: can(role, 'workspace.audit'),
  };
  const [members, pending, audit, dateFormat, toleranceDeg] = await Promise.all([
    membersOf(workspace.id),
    may.invite ? pendingInvitations(workspace.id) : Promise.resolve([]),
    may.audit ? workspaceActivity(workspace.id, 200) : Promise.resolve([]),
    requestDateFormat(),
    workspaceToleranceDeg(db(), workspace.id),
  ]);
  const invitations = pending.map(({ expiresAt, ...invitation }) => ({ ...invitation, expiresOn: formatDate(expiresAt, dateFormat) }));
  return (
    <section className="space-y-8">
      <div>
        <h1 className="text-2xl font-bold">{workspace.name}</h1>
        <p className="text-sm text-steel-600 dark:text-steel-300">
          {workspace.kind === 'personal' ? 'Personal workspace' : 'Shop workspace'} · you are {role}
        </p>
        <nav aria-label="Workspace" className="mt-3 flex gap-4 text-sm">
          <Link href={`/w/${workspace.slug}/templates`} className="font-medium text-gauge-700 underline dark:text-gauge-300">
            Engine templates
          </Link>
          <Link href={`/w/${workspace.slug}/builds`} className="font-medium text-gauge-700 underline dark:text-gauge-300">
            Build records
          </Link>
          <Link href="/printer-check" className="font-medium text-gauge-700 underline dark:text-gauge-300">
            Printer check
          </Link>
        </nav>
      </div>

      <div className="space-y-2">
        <h2 className="text-lg font-semibold">Members</h2>
        <MembersPanel slug={workspace.slug} members={members} myUserId={user.id} canManage={may.manageMembers} />
      </div>

      <div className="space-y-2">
        <h2 className="text-lg font-semibold">Printer profiles</h2>
        <WorkspaceProfiles workspaceSlug={workspace.slug} canEdit={can(role, 'printer-profile.edit')} canSetDefault={can(role, 'printer-profile.set-default')} />
      </div>

      {may.settings || may.invite || may.audit ? (
        <div className="space-y-6 border-t border-steel-200 pt-6 dark:border-steel-700">
          <h2 className="text-lg font-semibold">Settings</h2>
          {may.invite && workspace.kind === 'shop' ? (
            <div className="space-y-2">
              <h3 className="font-medium">Invite someone</h3>
              <InviteForm slug={workspace.slug} />
              <h3 className="pt-2 font-medium">Waiting invitations</h3>
              <PendingInvitations slug={workspace.slug} invitations={invitations} />
            </div>
          ) : null}
          {may.invite && workspace.kind !== 'shop' ? (
            <p className="text-sm text-steel-600 dark:text-steel-300">A personal workspace is yours alone; create a shop workspace to invite others.</p>
          ) : null}
          {may.settings ? (
            <div className="space-y-2">
              <h3 className="font-medium">Name</h3>
              <ShopNameForm renameSlug={workspace.slug} currentName={workspace.name} />
              <h3 className="pt-2 font-medium">Build records</h3>
              <BuildSettingsForm slug={workspace.slug} settings={{ toleranceDeg }} />
            </div>
          ) : null}
          {may.audit ? (
            <div id="activity" className="space-y-2">
              <h3 className="font-medium">Recent activity</h3>
              <ActivityList
                lines={audit.map((record) => activityLine(record, workspace.slug, dateFormat.locale))}
                group={group}
                dateFormat={dateFormat}
                hrefFor={(g) => (g === 'all' ? `/w/${workspace.slug}#activity` : `/w/${workspace.slug}?activity=${g}#activity`)}
              />
            </div>
          ) : null}
        </div>
      ) : null}
    </section>
  );
}
