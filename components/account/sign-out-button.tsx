'use client';

import { signOut } from 'next-auth/react';

export function SignOutButton() {
  return (
    <button
      type="button"
      onClick={() => signOut({ callbackUrl: '/' })}
      className="rounded px-2 py-1 text-sm hover:bg-steel-100 dark:hover:bg-steel-800"
    >
      Sign out
    </button>
  );
}
