import * as list from '@/app/api/v1/workspaces/[workspace]/templates/route';
import * as one from '@/app/api/v1/workspaces/[workspace]/templates/[id]/route';
import * as archive from '@/app/api/v1/workspaces/[workspace]/templates/[id]/archive/route';
import * as revisions from '@/app/api/v1/workspaces/[workspace]/templates/[id]/revisions/route';
import * as restore from '@/app/api/v1/workspaces/[workspace]/templates/[id]/revisions/[version]/restore/route';
import * as photos from '@/app/api/v1/workspaces/[workspace]/templates/[id]/photos/route';
import * as photo from '@/app/api/v1/workspaces/[workspace]/templates/[id]/photos/[photoId]/route';
import * as importRoute from '@/app/api/v1/workspaces/[workspace]/templates/import/route';
import * as exportRoute from '@/app/api/v1/workspaces/[workspace]/templates/export/route';
import { jsonRequest, routeParams } from '@/tests/support/call-route';

/** Calls the template route handlers directly, as Next would, with JSON helpers. */
const BASE = 'http://test.local/api/v1/workspaces';

const json = jsonRequest;
const p = routeParams;

export const api = {
  list: (ws: string, query = '') => list.GET(json('GET', `${BASE}/${ws}/templates${query}`), p({ workspace: ws })),
  create: (ws: string, body: unknown) => list.POST(json('POST', `${BASE}/${ws}/templates`, body), p({ workspace: ws })),
  get: (ws: string, id: number | string) => one.GET(json('GET', `${BASE}/${ws}/templates/${id}`), p({ workspace: ws, id: String(id) })),
  patch: (ws: string, id: number | string, body: unknown) =>
    one.PATCH(json('PATCH', `${BASE}/${ws}/templates/${id}`, body), p({ workspace: ws, id: String(id) })),
  delete: (ws: string, id: number | string) => one.DELETE(json('DELETE', `${BASE}/${ws}/templates/${id}`), p({ workspace: ws, id: String(id) })),
  archive: (ws: string, id: number | string, body?: unknown) =>
    archive.POST(json('POST', `${BASE}/${ws}/templates/${id}/archive`, body), p({ workspace: ws, id: String(id) })),
  revisions: (ws: string, id: number | string) =>
    revisions.GET(json('GET', `${BASE}/${ws}/templates/${id}/revisions`), p({ workspace: ws, id: String(id) })),
  restore: (ws: string, id: number | string, version: number, body: unknown) =>
    restore.POST(json('POST', `${BASE}/${ws}/templates/${id}/revisions/${version}/restore`, body), p({ workspace: ws, id: String(id), version: String(version) })),
  upload: (ws: string, id: number | string, file: Blob, fileName: string, headers: Record<string, string> = {}) => {
    const form = new FormData();
    form.set('photo', file, fileName);
    return photos.POST(new Request(`${BASE}/${ws}/templates/${id}/photos`, { method: 'POST', body: form, headers }), p({ workspace: ws, id: String(id) }));
  },
  photos: (ws: string, id: number | string) => photos.GET(json('GET', `${BASE}/${ws}/templates/${id}/photos`), p({ workspace: ws, id: String(id) })),
  photo: (ws: string, id: number | string, photoId: number, size = '') =>
    photo.GET(json('GET', `${BASE}/${ws}/templates/${id}/photos/${photoId}${size ? `?size=${size}` : ''}`), p({ workspace: ws, id: String(id), photoId: String(photoId) })),
  deletePhoto: (ws: string, id: number | string, photoId: number) =>
    photo.DELETE(json('DELETE', `${BASE}/${ws}/templates/${id}/photos/${photoId}`), p({ workspace: ws, id: String(id), photoId: String(photoId) })),
  importCsv: (ws: string, csv: string | Uint8Array, options: { query?: string; headers?: Record<string, string> } = {}) =>
    importRoute.POST(
      new Request(`${BASE}/${ws}/templates/import${options.query ?? ''}`, {
        method: 'POST',
        headers: { 'content-type': 'text/csv', ...options.headers },
        body: csv as BodyInit,
      }),
      p({ workspace: ws }),
    ),
  importForm: (ws: string, csv: string, fields: Record<string, string> = {}) => {
    const form = new FormData();
    form.set('file', new Blob([csv], { type: 'text/csv' }), 'templates.csv');
    for (const [name, value] of Object.entries(fields)) form.set(name, value);
    return importRoute.POST(new Request(`${BASE}/${ws}/templates/import`, { method: 'POST', body: form }), p({ workspace: ws }));
  },
  exportCsv: (ws: string) => exportRoute.GET(json('GET', `${BASE}/${ws}/templates/export`), p({ workspace: ws })),
};

/** An invented template with plausible small two-stroke figures. */
export const SAMPLE = {
  name: 'Test single 50',
  description: 'Invented 50 cc piston-port single for tests',
  boreMm: 40,
  strokeMm: 39.2,
  rodMm: 85,
  rotation: 'ccw',
  rimDiameterMm: 112,
  faceDiameterMm: 104,
  flangeDiameterMm: 130,
  hubHoleMm: 22,
  staticAdvanceDeg: 17,
  advanceMarksDeg: [16, 17, 18],
  portTargets: [
    { name: 'exhaust', opensCrankDeg: 92, closesCrankDeg: 268 },
    { name: 'transfer', opensCrankDeg: 118, closesCrankDeg: 242 },
  ],
  notes: 'Pointer sits at the left crankcase bolt.',
} as const;
