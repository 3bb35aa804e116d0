'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { FormMessage } from '@/components/account/form-controls';
import { submitJson } from '@/components/account/submit-json';
import { inputClass } from '@/components/generator/fields';
import { ConfirmDialog, type ConfirmText } from '@/components/shell/confirm-dialog';
import { ScrollRegion } from '@/components/shell/scroll-region';
import type { Role } from '@/lib/roles';
import { ROLE_OPTIONS } from '@/lib/access-policy';

type Member = { userId: number; name: string; email: string; role: Role };
type Props = { slug: string; members: Member[]; myUserId: number; canManage: boolean };

/** A request waiting for its confirm step. */
type Pending = ConfirmText & { danger?: boolean; method: string; url: string; body?: unknown; done: string; after?: () => void };

const article = (role: Role) => (role === 'owner' ? 'an' : 'a');
const roleMeaning = (role: Role) => ROLE_OPTIONS.find((o) => o.value === role)?.label.split(' — ')[1] ?? '';

/**
 * The member list; owners change roles and remove members, everyone may leave. Every change goes through a
 * confirm step that names it: choosing in the role menu (arrow keys included) only picks, "Change role" asks.
 */
export function MembersPanel({ slug, members, myUserId, canManage }: Props) {
  const router = useRouter();
  const [message, setMessage] = useState<{ tone: 'info' | 'error'; text: string } | undefined>();
  const [drafts, setDrafts] = useState<Record<number, Role>>({});
  const [pending, setPending] = useState<Pending | undefined>();
  const [busy, setBusy] = useState(false);

  const run = async (request: Pending) => {
    setBusy(true);
    const result = await submitJson(request.url, request.method, request.body);
    setBusy(false);
    setPending(undefined);
    setDrafts({});
    if (!result.ok) return setMessage({ tone: 'error', text: String(result.body.error ?? `Failed (HTTP ${result.status})`) });
    setMessage({ tone: 'info', text: request.done });
    if (request.after) request.after();
    else router.refresh();
  };

  const askRole = (m: Member, role: Role) =>
    setPending({
      title: `Make ${m.name} ${article(role)} ${role}?`,
      message: `${m.name} is ${article(m.role)} ${m.role} now. As ${article(role)} ${role} they may ${roleMeaning(role)}.`,
      confirmLabel: `Make ${role}`,
      method: 'PATCH',
      url: `/api/v1/workspaces/${slug}/members/${m.userId}`,
      body: { role },
      done: `${m.name} is now ${article(role)} ${role}.`,
    });

  const askRemove = (m: Member) =>
    setPending({
      title: `Remove ${m.name}?`,
      message: `${m.name} loses access to this workspace’s templates and records at once. Their past changes stay in the history.`,
      confirmLabel: `Remove ${m.name}`,
      danger: true,
      method: 'DELETE',
      url: `/api/v1/workspaces/${slug}/members/${m.userId}`,
      done: `${m.name} was removed.`,
    });

  const askLeave = () =>
    setPending({
      title: 'Leave this workspace?',
      message: 'You lose access to its templates and records; an owner has to invite you again to come back.',
      confirmLabel: 'Leave',
      danger: true,
      method: 'POST',
      url: `/api/v1/workspaces/${slug}/leave`,
      done: 'You have left the workspace.',
      after: () => {
        router.push('/account');
        router.refresh();
      },
    });

  return (
    <div className="space-y-3">
      <ScrollRegion label="Members">
        <table className="w-full max-w-3xl text-left text-sm">
          <caption className="sr-only">Members and their roles</caption>
          <thead className="border-b border-steel-200 text-xs uppercase text-steel-500 dark:border-steel-700">
            <tr>
              <th scope="col" className="py-2">Name</th>
              <th scope="col">E-mail</th>
              <th scope="col">Role</th>
              <th scope="col"><span className="sr-only">Actions</span></th>
            </tr>
          </thead>
          <tbody>
            {members.map((m) => {
              const draft = drafts[m.userId] ?? m.role;
              return (
                <tr key={m.userId} className="border-b border-steel-100 dark:border-steel-800">
                  <td className="py-2 pr-3">{m.name}{m.userId === myUserId ? ' (you)' : ''}</td>
                  <td className="pr-3">{m.email}</td>
                  <td className="pr-3">
                    {canManage ? (
                      <div className="flex flex-wrap items-center gap-2 py-1">
                        <select
                          aria-label={`Role of ${m.name}`}
                          value={draft}
                          className={`${inputClass} max-w-[11rem]`}
                          onChange={(e) => setDrafts((was) => ({ ...was, [m.userId]: e.target.value as Role }))}
                        >
                          {ROLE_OPTIONS.map((o) => (
                            <option key={o.value} value={o.value}>{o.value}</option>
                          ))}
                        </select>
                        {draft !== m.role ? (
                          <button
                            type="button"
                            onClick={() => askRole(m, draft)}
                            className="min-h-11 rounded-md bg-gauge-600 px-3 text-sm font-semibold text-white hover:bg-gauge-700"
                          >
                            Change role<span className="sr-only"> of {m.name}</span>
                          </button>
                        ) : null}
                      </div>
                    ) : (
                      m.role
                    )}
                  </td>
                  <td className="text-right">
                    {m.userId === myUserId ? (
                      <button type="button" className="min-h-11 px-2 text-sm text-red-700 underline dark:text-red-400" onClick={askLeave}>
                        Leave
                      </button>
                    ) : canManage ? (
                      <button type="button" className="min-h-11 px-2 text-sm text-red-700 underline dark:text-red-400" onClick={() => askRemove(m)}>
                        Remove {m.name}
                      </button>
                    ) : null}
                  </td>
                </tr>
              );
            })}
          </tbody>
        </table>
      </ScrollRegion>
      <FormMessage tone={message?.tone} message={message?.text} />
      <ConfirmDialog
        open={pending !== undefined}
        title={pending?.title ?? ''}
        message={pending?.message ?? ''}
        confirmLabel={pending?.confirmLabel ?? ''}
        danger={pending?.danger}
        busy={busy}
        onConfirm={() => pending && void run(pending)}
        onCancel={() => setPending(undefined)}
      />
    </div>
  );
}
