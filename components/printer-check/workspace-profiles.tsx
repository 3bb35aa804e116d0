'use client';

import { useState } from 'react';
import useSWR from 'swr';
import { FormMessage } from '@/components/account/form-controls';
import { submitJson } from '@/components/account/submit-json';
import { describeScale, type PrinterProfile } from '@/lib/printer-profile';
import { usePrinterProfiles } from './use-printer-profiles';

type Props = { workspaceSlug: string; canEdit: boolean; canSetDefault?: boolean };

const fetchProfiles = async (url: string): Promise<PrinterProfile[]> => {
  const res = await fetch(url);
  if (!res.ok) throw new Error(((await res.json()) as { error?: string }).error ?? `HTTP ${res.status}`);
  return res.json();
};

const fetchDefault = async (url: string): Promise<{ profile: PrinterProfile | null }> => {
  const res = await fetch(url);
  if (!res.ok) throw new Error(((await res.json()) as { error?: string }).error ?? `HTTP ${res.status}`);
  return res.json();
};

/**
 * The printer profiles saved in a workspace, for signed-in members: listed for everyone,
 * and technicians and owners can copy this browser's profiles in or delete one; an owner marks the
 * default that the workspace's template and build sheets are corrected with.
 */
export function WorkspaceProfiles({ workspaceSlug, canEdit, canSetDefault = false }: Props) {
  const url = `/api/v1/workspaces/${workspaceSlug}/printer-profiles`;
  const { data, error, mutate } = useSWR(url, fetchProfiles);
  const defaultUrl = `${url}/default`;
  const { data: current, mutate: mutateDefault } = useSWR(defaultUrl, fetchDefault);
  const [message, setMessage] = useState<{ tone: 'info' | 'error'; text: string } | undefined>();
  const local = usePrinterProfiles();

  const saveLocal = async (profile: PrinterProfile) => {
    const result = await submitJson(url, 'POST', {
      name: profile.name,
      printerScaleX: profile.printerScaleX,
      printerScaleY: profile.printerScaleY,
    });
    setMessage(result.ok ? { tone: 'info', text: `Saved “${profile.name}” to the workspace.` } : { tone: 'error', text: String(result.body.error) });
    await mutate();
  };

  const makeDefault = async (profile: PrinterProfile | null) => {
    const result = await submitJson(defaultUrl, 'PUT', { profileId: profile ? Number(profile.id) : null });
    setMessage(
      result.ok
        ? { tone: 'info', text: profile ? `Sheets of this workspace are now corrected for “${profile.name}”.` : 'Sheets of this workspace are no longer corrected by default.' }
        : { tone: 'error', text: String(result.body.error) },
    );
    await mutateDefault();
  };

  const remove = async (profile: PrinterProfile) => {
    const result = await submitJson(`${url}/${profile.id}`, 'DELETE');
    setMessage(result.ok ? { tone: 'info', text: `Deleted “${profile.name}”.` } : { tone: 'error', text: String(result.body.error) });
    await mutate();
  };

  return (
    <div className="space-y-3 text-sm">
      {error ? <p role="alert" className="text-red-700 dark:text-red-400">{String(error.message)}</p> : null}
      {!data ? (
        <p className="text-steel-500">Loading profiles…</p>
      ) : data.length === 0 ? (
        <p className="text-steel-500">No printer profiles saved in this workspace yet.</p>
      ) : (
        <ul aria-label="Workspace printer profiles" className="space-y-1">
          {data.map((p) => (
            <li key={p.id} className="flex items-center gap-3">
              <span className="font-medium">{p.name}</span>
              <span className="font-mono text-xs text-steel-500">{describeScale(p)}</span>
              {current?.profile?.id === p.id ? (
                <span className="rounded border border-gauge-600 px-1.5 text-xs font-semibold text-gauge-700 dark:text-gauge-500">default</span>
              ) : canSetDefault ? (
                <button type="button" className="text-gauge-700 underline dark:text-gauge-300" onClick={() => makeDefault(p)}>
                  Make {p.name} the default
                </button>
              ) : null}
              {canEdit ? (
                <button type="button" className="text-red-700 underline dark:text-red-400" onClick={() => remove(p)}>
                  Delete {p.name}
                </button>
              ) : null}
            </li>
          ))}
        </ul>
      )}
      {canSetDefault && current?.profile ? (
        <button type="button" className="text-gauge-700 underline dark:text-gauge-300" onClick={() => makeDefault(null)}>
          No default profile
        </button>
      ) : null}
      {canEdit && local.length > 0 ? (
        <div className="space-y-1">
          <p className="text-steel-600 dark:text-steel-300">Profiles kept in this browser:</p>
          <ul className="space-y-1">
            {local.map((p) => (
              <li key={p.id} className="flex items-center gap-3">
                <span>{p.name}</span>
                <span className="font-mono text-xs text-steel-500">{describeScale(p)}</span>
                <button type="button" className="text-gauge-700 underline dark:text-gauge-300" onClick={() => saveLocal(p)}>
                  Save {p.name} to the workspace
                </button>
              </li>
            ))}
          </ul>
        </div>
      ) : null}
      <FormMessage tone={message?.tone} message={message?.text} />
    </div>
  );
}
