import type { Build } from '@/lib/builds/build';
import type { BuildFields } from '@/lib/builds/build-fields';
import { buildResults } from '@/lib/builds/build-results';
import { emptyBuild } from '@/lib/builds/build-schema';

/**
 * An invented customer's engine with the figures worked by hand in tests/lib/builds/build-results.test.ts
 * (stroke 40 mm, rod 80 mm, Heywood eq. 2.5): what a technician types for a build.
 */
export const SAMPLE_ENGINE = {
  customerName: 'Avery Quillfeather',
  customerEmail: 'avery@customer.test',
  engineNumber: 'QX-0042',
  engineDescription: 'Invented 50 cc single',
  strokeMm: 40,
  rodMm: 80,
  deckMm: 0.5,
  stops: { numbering: 'full' as const, readingADeg: 340, readingBDeg: 24 },
  timingSetDegBTDC: 18,
  ports: [
    { name: 'Exhaust', heightMm: 17.5 },
    { name: 'Transfer', heightMm: 29.5 },
  ],
};

/**
 * A build record as the API would answer it, made without a database: invented customer,
 * stroke 40 mm, rod 80 mm (the figures worked by hand in tests/lib/builds/build-results.test.ts).
 */
export function sampleBuild(overrides: Partial<BuildFields> = {}, extra: Partial<Build> = {}): Build {
  const fields: BuildFields = {
    ...emptyBuild('2026-12-03'),
    ...SAMPLE_ENGINE,
    timingCheck: 'strobe',
    timingCheckRpm: 3000,
    portTargets: [
      { name: 'Exhaust', opensCrankDeg: 75, closesCrankDeg: 285 },
      { name: 'Transfer', opensCrankDeg: 114, closesCrankDeg: 246 },
    ],
    squishMm: 1.1,
    notes: 'Fitted a new stop-switch wire.',
    ...overrides,
  };
  const { ports: _measured, timingSetDegBTDC: _d, timingSetMmBTDC: _m, ...rest } = fields;
  return {
    id: 7,
    ...rest,
    ...buildResults(fields),
    technician: { id: 2, name: 'Rowan Tinsley' },
    template: null,
    finishedOn: '2026-12-04',
    handedOverOn: null,
    sends: [],
    version: 3,
    createdAt: '2026-12-03T09:00:00.000Z',
    updatedAt: '2026-12-04T09:00:00.000Z',
    createdBy: null,
    updatedBy: null,
    ...extra,
  };
}
