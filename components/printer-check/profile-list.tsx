'use client';

import { describeScale } from '@/lib/printer-profile';
import { deleteProfile } from './printer-profile-store';
import { usePrinterProfiles } from './use-printer-profiles';

/** The profiles kept in this browser, each with a delete button. */
export function ProfileList() {
  const profiles = usePrinterProfiles();
  if (profiles.length === 0) return <p className="text-sm text-steel-500">No printer profiles saved in this browser yet.</p>;
  return (
    <ul aria-label="Saved printer profiles" className="divide-y divide-steel-200 rounded-md border border-steel-200 bg-white dark:divide-steel-800 dark:border-steel-800 dark:bg-steel-900">
      {profiles.map((profile) => (
        <li key={profile.id} className="flex items-center justify-between gap-3 px-3 py-2 text-sm">
          <span>
            <span className="font-medium text-steel-900 dark:text-steel-100">{profile.name}</span>{' '}
            <span className="font-mono text-xs text-steel-500">{describeScale(profile)}</span>
          </span>
          <button
            type="button"
            onClick={() => void deleteProfile(profile.id)}
            className="rounded px-2 py-1 text-xs text-steel-600 hover:bg-steel-100 dark:text-steel-300 dark:hover:bg-steel-800"
          >
            Delete<span className="sr-only"> {profile.name}</span>
          </button>
        </li>
      ))}
    </ul>
  );
}
