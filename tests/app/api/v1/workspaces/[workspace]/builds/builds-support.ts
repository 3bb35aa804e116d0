import * as list from '@/app/api/v1/workspaces/[workspace]/builds/route';
import * as one from '@/app/api/v1/workspaces/[workspace]/builds/[id]/route';
import * as revisions from '@/app/api/v1/workspaces/[workspace]/builds/[id]/revisions/route';
import * as record from '@/app/api/v1/workspaces/[workspace]/builds/[id]/record/route';
import * as send from '@/app/api/v1/workspaces/[workspace]/builds/[id]/send/route';
import * as photos from '@/app/api/v1/workspaces/[workspace]/builds/[id]/photos/route';
import * as photo from '@/app/api/v1/workspaces/[workspace]/builds/[id]/photos/[photoId]/route';
import { jsonRequest, routeParams } from '@/tests/support/call-route';
import { SAMPLE_ENGINE } from '@/tests/support/sample-build';

/** Calls the build record route handlers directly, as Next would, with JSON helpers. */
const BASE = 'http://test.local/api/v1/workspaces';

const json = jsonRequest;
const p = routeParams;
const idParams = (ws: string, id: number | string) => p({ workspace: ws, id: String(id) });

export const buildApi = {
  list: (ws: string, query = '') => list.GET(json('GET', `${BASE}/${ws}/builds${query}`), p({ workspace: ws })),
  create: (ws: string, body: unknown) => list.POST(json('POST', `${BASE}/${ws}/builds`, body), p({ workspace: ws })),
  get: (ws: string, id: number | string) => one.GET(json('GET', `${BASE}/${ws}/builds/${id}`), idParams(ws, id)),
  patch: (ws: string, id: number | string, body: unknown) => one.PATCH(json('PATCH', `${BASE}/${ws}/builds/${id}`, body), idParams(ws, id)),
  delete: (ws: string, id: number | string) => one.DELETE(json('DELETE', `${BASE}/${ws}/builds/${id}`), idParams(ws, id)),
  revisions: (ws: string, id: number | string) => revisions.GET(json('GET', `${BASE}/${ws}/builds/${id}/revisions`), idParams(ws, id)),
  record: (ws: string, id: number | string, query = '?format=pdf') => record.GET(json('GET', `${BASE}/${ws}/builds/${id}/record${query}`), idParams(ws, id)),
  upload: (ws: string, id: number | string, file: Blob, fileName: string) => {
    const form = new FormData();
    form.set('photo', file, fileName);
    return photos.POST(new Request(`${BASE}/${ws}/builds/${id}/photos`, { method: 'POST', body: form }), idParams(ws, id));
  },
  photo: (ws: string, id: number | string, photoId: number, size = '') =>
    photo.GET(json('GET', `${BASE}/${ws}/builds/${id}/photos/${photoId}${size ? `?size=${size}` : ''}`), p({ workspace: ws, id: String(id), photoId: String(photoId) })),
  send: (ws: string, id: number | string) => send.POST(json('POST', `${BASE}/${ws}/builds/${id}/send`), idParams(ws, id)),
};

/** The sample engine as a technician sends it, checked with a static light. */
export const BUILD_SAMPLE = { ...SAMPLE_ENGINE, timingCheck: 'static-light' };
