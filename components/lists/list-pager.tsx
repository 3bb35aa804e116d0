'use client';

/** "Previous · Page 2 of 5 · Next" under a list; `label` names the navigation ("Template pages"). */
export function ListPager({ label, page, pages, onPage }: { label: string; page: number; pages: number; onPage: (page: number) => void }) {
  return (
    <nav aria-label={label} className="flex items-center gap-3 text-sm">
      <button type="button" disabled={page <= 1} onClick={() => onPage(page - 1)} className="min-h-11 rounded border border-steel-300 px-3 disabled:opacity-50">
        Previous
      </button>
      <span>
        Page {page} of {pages}
      </span>
      <button type="button" disabled={page >= pages} onClick={() => onPage(page + 1)} className="min-h-11 rounded border border-steel-300 px-3 disabled:opacity-50">
        Next
      </button>
    </nav>
  );
}
