'use client';

import { useEffect, useRef } from 'react';
import type { UseFormReset } from 'react-hook-form';
import { INSTRUCTION_PARAMS, SHEET_COOKIE } from '@/lib/sheet-link-params';
import { sheetQuery, type GeneratorFormValues } from './form-values';

const WRITE_DELAY_MS = 300;
const ONE_YEAR_S = 365 * 24 * 3600;

function rememberSheet(query: string) {
  document.cookie = `${SHEET_COOKIE}=${encodeURIComponent(query)}; path=/; max-age=${ONE_YEAR_S}; samesite=lax`;
}

/** Forgets the browser's last sheet (the "Start a new sheet" button). */
export function forgetSheet() {
  document.cookie = `${SHEET_COOKIE}=; path=/; max-age=0; samesite=lax`;
}

/**
 * Keeps the address bar and the browser's last sheet in step with the form, so a reload, the back button or a
 * shared link shows what was typed. The URL is replaced, not pushed: typing does not fill the history.
 * A page restored from the router's cache after "back" may carry older defaults than its URL: the URL wins.
 * Reading a URL back checks each value with the schema, so that reader is loaded only for a URL that differs
 * from the form (a reload or a shared link shows the form the server read from that same URL).
 */
export function useSheetUrl(values: GeneratorFormValues, defaultValues: GeneratorFormValues, reset: UseFormReset<GeneratorFormValues>) {
  const query = sheetQuery(values);
  const latestQuery = useRef(query);
  const checked = useRef(false);

  useEffect(() => {
    latestQuery.current = query;
  }, [query]);

  useEffect(() => {
    if (checked.current) return;
    checked.current = true;
    const inUrl = new URLSearchParams(window.location.search);
    if (INSTRUCTION_PARAMS.some((name) => inUrl.has(name)) || [...inUrl.keys()].length === 0) return;
    inUrl.delete('workspace');
    const served = sheetQuery(defaultValues);
    if (inUrl.toString() === served) return;
    void import('./form-values-from-query').then(({ formValuesFromQuery }) => {
      const fromUrl = formValuesFromQuery(inUrl).values;
      // Typing while the reader loaded wins over the URL.
      if (latestQuery.current === served && sheetQuery(fromUrl) !== served) reset(fromUrl);
    });
  }, [defaultValues, reset]);

  useEffect(() => {
    const timer = setTimeout(() => {
      // The workspace whose printer profiles are offered is not part of the form but of the page: it stays.
      const workspace = new URLSearchParams(window.location.search).get('workspace');
      const full = workspace ? `${query}${query ? '&' : ''}${new URLSearchParams({ workspace })}` : query;
      const href = full ? `${window.location.pathname}?${full}` : window.location.pathname;
      if (`${window.location.pathname}${window.location.search}` !== href) window.history.replaceState(window.history.state, '', href);
      rememberSheet(query);
    }, WRITE_DELAY_MS);
    return () => clearTimeout(timer);
  }, [query]);
}
