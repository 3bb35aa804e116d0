'use client';

import type { ReactNode, RefObject } from 'react';
import { inputClass } from '@/components/generator/fields';

/** The search box above a list; `label` says what it matches ("Search name and engine"). */
export function ListSearch({ id, label, text, onText, input }: { id: string; label: string; text: string; onText: (text: string) => void; input: RefObject<HTMLInputElement | null> }) {
  return (
    <div className="space-y-1">
      <label htmlFor={id} className="block text-sm font-medium">
        {label}
      </label>
      <input ref={input} id={id} type="search" value={text} onChange={(e) => onText(e.target.value)} className={`${inputClass} w-72 max-w-full`} />
    </div>
  );
}

/** One filter of a list as a labelled select; `options` in the order shown, the first usually "All"/"Any". */
export function ListFilter({ id, label, value, options, onChoose }: { id: string; label: string; value: string; options: Array<{ value: string; label: string }>; onChoose: (value: string) => void }) {
  return (
    <div className="space-y-1">
      <label htmlFor={id} className="block text-sm font-medium">
        {label}
      </label>
      <select id={id} value={value} onChange={(e) => onChoose(e.target.value)} className={inputClass}>
        {options.map((option) => (
          <option key={option.value} value={option.value}>
            {option.label}
          </option>
        ))}
      </select>
    </div>
  );
}

/** The row above a list: its search box and filters, then a live line saying how many rows match (or why none load). */
export function ListToolbar({ status, children }: { status: string; children: ReactNode }) {
  return (
    <div className="flex flex-wrap items-end gap-3">
      {children}
      <p role="status" aria-live="polite" className="text-sm text-steel-600 dark:text-steel-300">
        {status}
      </p>
    </div>
  );
}
