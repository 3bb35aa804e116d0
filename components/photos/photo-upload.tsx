'use client';

import { useRouter } from 'next/navigation';
import { useRef, useState } from 'react';
import { MAX_PHOTO_BYTES } from '@/lib/templates/photo-type';
import { inputClass } from '@/components/generator/fields';

/** Uploads one photo (JPEG, PNG or WebP up to 10 MB); the server checks the content and says why it refuses. */
export function PhotoUpload({ url }: { url: string }) {
  const router = useRouter();
  const fileRef = useRef<HTMLInputElement>(null);
  const [message, setMessage] = useState<{ tone: 'info' | 'error'; text: string }>();
  const [busy, setBusy] = useState(false);

  const onSubmit = async (event: React.FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const file = fileRef.current?.files?.[0];
    if (!file) return setMessage({ tone: 'error', text: 'Choose a photo first' });
    if (file.size > MAX_PHOTO_BYTES) return setMessage({ tone: 'error', text: 'The photo is larger than 10 MB' });
    setBusy(true);
    const form = new FormData(event.currentTarget);
    const res = await fetch(url, { method: 'POST', body: form }).catch(() => null);
    setBusy(false);
    if (!res) return setMessage({ tone: 'error', text: 'The server could not be reached' });
    const body = (await res.json().catch(() => ({}))) as { error?: string };
    if (!res.ok) return setMessage({ tone: 'error', text: body.error ?? `Upload failed (HTTP ${res.status})` });
    setMessage({ tone: 'info', text: 'Photo added (stored without its camera metadata)' });
    event.currentTarget?.reset();
    router.refresh();
  };

  return (
    <form onSubmit={onSubmit} aria-label="Add a photo" className="flex flex-wrap items-end gap-3">
      <div className="space-y-1">
        <label htmlFor="photo-file" className="block text-sm font-medium">
          Photo <span className="font-normal text-steel-500">(JPEG, PNG or WebP, up to 10 MB)</span>
        </label>
        <input id="photo-file" ref={fileRef} name="photo" type="file" accept="image/jpeg,image/png,image/webp" className="text-sm" />
      </div>
      <div className="space-y-1">
        <label htmlFor="photo-caption" className="block text-sm font-medium">
          Caption
        </label>
        <input id="photo-caption" name="caption" maxLength={200} className={`${inputClass} w-64`} />
      </div>
      <button type="submit" disabled={busy} className="min-h-11 rounded-md bg-gauge-600 px-4 text-sm font-semibold text-white disabled:opacity-60">
        {busy ? 'Uploading…' : 'Upload'}
      </button>
      <p role={message?.tone === 'error' ? 'alert' : 'status'} aria-live="polite" className={`w-full text-sm empty:hidden ${message?.tone === 'error' ? 'text-red-700' : 'text-steel-700'}`}>
        {message?.text ?? ''}
      </p>
    </form>
  );
}
