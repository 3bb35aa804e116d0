'use client';

import { formatCount } from '@/lib/format/number-format';

/** "Previous · Page 2 of 5 · Next" under a list of `total` rows; `label` names the navigation ("Template pages"). */
export function ListPager({ label, page, total, pageSize, locale, onPage }: { label: string; locale: string; page: number; total: number; pageSize: number; onPage: (page: number) => void }) {
  const pages = Math.max(1, Math.ceil(total / pageSize));
  return (
    <nav aria-label={label} className="flex items-center gap-3 text-sm">
      <button type="button" disabled={page <= 1} onClick={() => onPage(page - 1)} className="min-h-11 rounded border border-steel-300 px-3 disabled:opacity-50">
        Previous
      </button>
      <span>
        Page {formatCount(page, locale)} of {formatCount(pages, locale)}
      </span>
      <button type="button" disabled={page >= pages} onClick={() => onPage(page + 1)} className="min-h-11 rounded border border-steel-300 px-3 disabled:opacity-50">
        Next
      </button>
    </nav>
  );
}
