import { describe, expect, it } from 'vitest';
import { DEMO_BUILDS } from '@/db/seeds/03_demo_builds';
import { DEMO_TEMPLATES } from '@/db/seeds/02_demo_templates';
import { BUILD_STATUSES } from '@/lib/builds/build-fields';
import { buildResults } from '@/lib/builds/build-results';
import { buildSchema, emptyBuild } from '@/lib/builds/build-schema';

describe('demo build records (db/seeds/03_demo_builds.ts)', () => {
  const records = DEMO_BUILDS.map(({ template, by: _by, finishedOn: _f, handedOverOn: _h, sentAt: _s, ...demo }) => {
    const t = DEMO_TEMPLATES.find((x) => x.name === template)!;
    return {
      template,
      parsed: buildSchema.safeParse({ ...emptyBuild('2026-11-01'), strokeMm: t.strokeMm, rodMm: t.rodMm, portTargets: t.portTargets, ...demo }),
    };
  });

  it('are valid records of existing demo templates, covering every status', () => {
    for (const r of records) expect(r.parsed.success, r.template).toBe(true);
    expect(new Set(DEMO_BUILDS.map((b) => b.status ?? 'open'))).toEqual(new Set(BUILD_STATUSES));
  });

  it('measure port durations near the template targets: all but the deliberately late exhaust within ±2° (common practice)', () => {
    const verdicts = records.flatMap((r) => buildResults(r.parsed.data!).ports.map((p) => `${r.template} ${p.name} ${p.withinTolerance}`));
    expect(verdicts.filter((v) => v.endsWith('false'))).toEqual(['Harbour 50 moped, sport cylinder exhaust false']);
    expect(verdicts.filter((v) => v.endsWith('true'))).toHaveLength(5);
  });
});
