'use client';

import { signOutTo } from './sign-out';

export function SignOutButton() {
  return (
    <button
      type="button"
      onClick={() => void signOutTo('/')}
      className="min-h-11 rounded px-2 text-sm hover:bg-steel-100 dark:hover:bg-steel-800"
    >
      Sign out
    </button>
  );
}
