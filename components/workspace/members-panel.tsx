'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { FormMessage } from '@/components/account/form-controls';
import { submitJson } from '@/components/account/submit-json';
import { inputClass } from '@/components/generator/fields';
import { ScrollRegion } from '@/components/shell/scroll-region';
import type { Role } from '@/lib/roles';
import { ROLE_OPTIONS } from '@/lib/access-policy';

type Member = { userId: number; name: string; email: string; role: Role };
type Props = { slug: string; members: Member[]; myUserId: number; canManage: boolean };

/** The member list; owners change roles and remove members, everyone may leave. */
export function MembersPanel({ slug, members, myUserId, canManage }: Props) {
  const router = useRouter();
  const [message, setMessage] = useState<{ tone: 'info' | 'error'; text: string } | undefined>();

  const act = async (method: string, url: string, body: unknown, done: string, after?: () => void, undo?: () => void) => {
    const result = await submitJson(url, method, body);
    if (!result.ok) {
      undo?.();
      return setMessage({ tone: 'error', text: String(result.body.error ?? `Failed (HTTP ${result.status})`) });
    }
    setMessage({ tone: 'info', text: done });
    if (after) after();
    else router.refresh();
  };

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
          {members.map((m) => (
            <tr key={m.userId} className="border-b border-steel-100 dark:border-steel-800">
              <td className="py-2">{m.name}{m.userId === myUserId ? ' (you)' : ''}</td>
              <td>{m.email}</td>
              <td>
                {canManage ? (
                  <select
                    aria-label={`Role of ${m.name}`}
                    defaultValue={m.role}
                    className={`${inputClass} max-w-[11rem] py-1`}
                    onChange={(e) => {
                      const select = e.currentTarget;
                      const role = select.value;
                      // A refused change (the last owner) puts the menu back to the role that stands.
                      void act('PATCH', `/api/v1/workspaces/${slug}/members/${m.userId}`, { role }, `${m.name} is now ${role}.`, undefined, () => {
                        select.value = m.role;
                      });
                    }}
                  >
                    {ROLE_OPTIONS.map((o) => (
                      <option key={o.value} value={o.value}>{o.value}</option>
                    ))}
                  </select>
                ) : (
                  m.role
                )}
              </td>
              <td className="text-right">
                {m.userId === myUserId ? (
                  <button
                    type="button"
                    className="text-sm text-red-700 underline dark:text-red-400"
                    onClick={() =>
                      act('POST', `/api/v1/workspaces/${slug}/leave`, undefined, 'You have left the workspace.', () => {
                        router.push('/account');
                        router.refresh();
                      },
                      )
                    }
                  >
                    Leave
                  </button>
                ) : canManage ? (
                  <button
                    type="button"
                    className="text-sm text-red-700 underline dark:text-red-400"
                    onClick={() => act('DELETE', `/api/v1/workspaces/${slug}/members/${m.userId}`, undefined, `${m.name} was removed.`)}
                  >
                    Remove {m.name}
                  </button>
                ) : null}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
      </ScrollRegion>
      <FormMessage tone={message?.tone} message={message?.text} />
    </div>
  );
}
