import type { Build } from '@/lib/builds/build';
import type { BuildIssue } from '@/lib/builds/build-schema';

export type SaveOutcome =
  | { ok: true; build: Build; changed: boolean }
  | { ok: false; reason: 'not-found' }
  | { ok: false; reason: 'conflict'; current: Build }
  | { ok: false; reason: 'forbidden'; message: string }
  | { ok: false; reason: 'invalid'; issues: BuildIssue[] };
