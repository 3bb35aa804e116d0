'use client';

import { signOut } from 'next-auth/react';

export function SignOutButton() {
  return (
    <button
      type="button"
      onClick={() => signOut({ callbackUrl: '/' })}
      className="min-h-11 rounded px-2 text-sm hover:bg-steel-100 dark:hover:bg-steel-800"
    >
      Sign out
    </button>
  );
}
