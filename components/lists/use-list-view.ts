'use client';

import { usePathname, useRouter, useSearchParams } from 'next/navigation';
import { useCallback, useEffect, useMemo, useRef, useState } from 'react';

const SEARCH_DELAY_MS = 250;

/**
 * A list's view lives in the URL (`?q=&sort=&dir=&page=` and its filters), so a reload, the back
 * button and a shared link show the same rows. `fromParams` and `href` are the list's own
 * (lib/templates/list-view.ts, lib/builds/list-view.ts); `show(patch)` replaces the URL.
 */
export function useListView<V>(fromParams: (params: URLSearchParams) => V, href: (pathname: string, view: V) => string) {
  const searchParams = useSearchParams();
  const pathname = usePathname();
  const { replace } = useRouter();
  const view = useMemo(() => fromParams(new URLSearchParams(searchParams.toString())), [searchParams, fromParams]);
  const show = useCallback((patch: Partial<V>) => replace(href(pathname, { ...view, ...patch }), { scroll: false }), [view, pathname, replace, href]);
  return { view, show };
}

/**
 * The search box text: typing stays instant and reaches the URL after a pause; it follows the URL
 * (back button, links) but never overwrites what is being typed.
 */
export function useSearchText(urlQ: string, show: (patch: { q: string; page: number }) => void) {
  const [text, setText] = useState(urlQ);
  const sent = useRef(urlQ);
  const input = useRef<HTMLInputElement>(null);

  // Text typed into the server-rendered box before hydration is in the DOM but not in state: adopt it.
  useEffect(() => {
    const typed = input.current?.value;
    if (typed !== undefined && typed !== urlQ) setText(typed);
  }, []); // eslint-disable-line react-hooks/exhaustive-deps -- once, on mount: urlQ is the server-rendered value

  useEffect(() => {
    if (urlQ.trim() === sent.current.trim()) return;
    sent.current = urlQ;
    setText(urlQ);
  }, [urlQ]);

  useEffect(() => {
    if (text.trim() === sent.current.trim()) return;
    const timer = setTimeout(() => {
      sent.current = text;
      show({ q: text, page: 1 });
    }, SEARCH_DELAY_MS);
    return () => clearTimeout(timer);
  }, [text, show]);

  return { text, setText, input };
}

/** SWR's fetcher for a list page of the JSON API: the API's own error text when it refuses. */
export async function fetchListPage<P>(url: string): Promise<P> {
  const res = await fetch(url);
  if (!res.ok) throw new Error(((await res.json().catch(() => ({}))) as { error?: string }).error ?? `HTTP ${res.status}`);
  return res.json();
}
