'use client';

import type { ComponentProps } from 'react';
import { useHydrated } from './use-hydrated';

/**
 * A form whose controls stay disabled until React has hydrated it: anything typed
 * into the server-rendered HTML before then would be overwritten or garbled by the
 * form library taking over the fields.
 */
export function HydratedForm({ className, children, ...formProps }: ComponentProps<'form'>) {
  const hydrated = useHydrated();
  return (
    <form {...formProps}>
      <fieldset disabled={!hydrated} className={`m-0 min-w-0 border-0 p-0 ${className ?? ''}`}>
        {children}
      </fieldset>
    </form>
  );
}
