'use client';

import { createContext, useContext } from 'react';
import { DEFAULT_LOCALE } from '@/lib/format/date-format';

const ReaderLocaleContext = createContext(DEFAULT_LOCALE);

/**
 * The reader's locale for the client components below it, set by a server layout from the
 * request's Accept-Language (app/lib/date-format.ts), so figures read the same on the server
 * render and in the browser (lib/format/number-format.ts).
 */
export function ReaderLocale({ locale, children }: { locale: string; children: React.ReactNode }) {
  return <ReaderLocaleContext value={locale}>{children}</ReaderLocaleContext>;
}

export function useReaderLocale(): string {
  return useContext(ReaderLocaleContext);
}
