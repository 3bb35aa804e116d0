'use client';

import { useEffect, useRef } from 'react';

export type ConfirmText = {
  /** The question, naming the thing: "Make Teo Lindqvist an owner?" */
  title: string;
  /** What will happen, in plain words. */
  message: string;
  /** The confirming button says the action: "Make owner", "Delete template". */
  confirmLabel: string;
};

type Props = ConfirmText & { open: boolean; busy?: boolean; danger?: boolean; onConfirm: () => void; onCancel: () => void };

/**
 * A modal confirm step (the browser's own <dialog>: focus moves in, Escape cancels, the page behind is inert).
 * Focus starts on Cancel, so an Enter pressed by habit does not confirm.
 */
export function ConfirmDialog({ open, title, message, confirmLabel, busy, danger, onConfirm, onCancel }: Props) {
  const ref = useRef<HTMLDialogElement>(null);
  const cancelRef = useRef<HTMLButtonElement>(null);
  useEffect(() => {
    const dialog = ref.current;
    if (!dialog) return;
    if (open && !dialog.open) {
      dialog.showModal();
      cancelRef.current?.focus();
    }
    if (!open && dialog.open) dialog.close();
  }, [open]);
  return (
    <dialog
      ref={ref}
      aria-labelledby="confirm-title"
      aria-describedby="confirm-message"
      onCancel={(event) => {
        event.preventDefault();
        onCancel();
      }}
      className="m-auto w-[min(28rem,calc(100vw-2rem))] rounded-lg border border-steel-300 bg-white p-5 text-steel-900 shadow-xl backdrop:bg-steel-950/50 dark:border-steel-700 dark:bg-steel-900 dark:text-steel-100"
    >
      <h2 id="confirm-title" className="text-lg font-semibold">
        {title}
      </h2>
      <p id="confirm-message" className="mt-2 text-sm text-steel-700 dark:text-steel-300">
        {message}
      </p>
      <div className="mt-4 flex flex-wrap justify-end gap-2">
        <button ref={cancelRef} type="button" onClick={onCancel} className="min-h-11 rounded-md border border-steel-300 px-4 text-sm font-medium dark:border-steel-600">
          Cancel
        </button>
        <button
          type="button"
          onClick={onConfirm}
          disabled={busy}
          className={`min-h-11 rounded-md px-4 text-sm font-semibold text-white disabled:opacity-60 ${danger ? 'bg-red-700 hover:bg-red-800' : 'bg-gauge-600 hover:bg-gauge-700'}`}
        >
          {busy ? 'Working…' : confirmLabel}
        </button>
      </div>
    </dialog>
  );
}
