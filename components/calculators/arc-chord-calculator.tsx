'use client';

import { HydratedForm } from '@/components/hydrated-form';
import { useState } from 'react';
import { FormProvider, useForm } from 'react-hook-form';
import { TextField } from '@/components/generator/fields';
import { arcChordRows } from '@/lib/engine/arc-chord-rows';
import { arcChordFields, arcChordSchema, type ArcChordInput, type ArcChordRequest } from '@/lib/engine/arc-chord-schema';
import { scribeChartHref } from '@/lib/engine/wheel-links';
import { LengthField } from './length-field';
import { mmToUnit, type LengthUnit } from '@/lib/fields/length';
import { formatDecimal, formatDeg } from '@/lib/format/number-format';
import { useReaderLocale } from '@/components/format/reader-locale';
import { ResultPanel, WaitingForInput } from './result-panel';
import { shownUnitResolver, useRecheckOnUnit } from './shown-unit-resolver';
import { UnitSwitch } from './unit-switch';
import { useLiveResult } from './use-live-result';
import { WheelLink } from './wheel-link';

/** Distances from the TDC mark round the rim (arc) and straight across (chord, for dividers). */
export function ArcChordCalculator() {
  const locale = useReaderLocale();
  const [unit, setUnit] = useState<LengthUnit>('mm');
  const form = useForm<ArcChordInput, unknown, ArcChordRequest>({
    resolver: shownUnitResolver(arcChordSchema, arcChordFields),
    context: { unit },
    defaultValues: { diameterMm: 118, anglesDeg: '16, 17, 18, 19, 20' },
    mode: 'onChange',
  });
  useRecheckOnUnit(form, unit);
  const result = useLiveResult(form.control, arcChordSchema, (valid) => ({ ...valid, rows: arcChordRows(valid) }));
  const places = unit === 'in' ? 3 : 2;

  return (
    <div className="grid gap-6 lg:grid-cols-[1fr_minmax(0,24rem)]">
      <FormProvider {...form}>
        <HydratedForm noValidate onSubmit={form.handleSubmit(() => undefined)} aria-label="Diameter and angles" className="space-y-4">
          <div className="flex justify-end">
            <UnitSwitch unit={unit} onChange={setUnit} idPrefix="arc" />
          </div>
          <LengthField<ArcChordInput> name="diameterMm" label="Diameter where you mark" unit={unit} help="The flywheel rim or face diameter, measured with calipers." />
          <TextField<ArcChordInput>
            name="anglesDeg"
            label="Angles from TDC"
            mono
            help="Degrees, separated by commas or spaces, each 0–360."
          />
        </HydratedForm>
      </FormProvider>
      <ResultPanel title="Distances from the TDC mark" id="arc-result">
        {result ? (
          <>
            <table className="w-full text-left text-sm tabular-nums">
              <caption className="sr-only">Arc and chord for each angle</caption>
              <thead className="text-xs text-steel-500">
                <tr>
                  <th scope="col" className="pr-3">Angle</th>
                  <th scope="col" className="pr-3">Round the rim ({unit})</th>
                  <th scope="col" className="pr-3">Straight, dividers ({unit})</th>
                </tr>
              </thead>
              <tbody className="font-mono">
                {result.rows.map((row, index) => (
                  <tr key={`${row.angleDeg}-${index}`} className="border-t border-steel-100 dark:border-steel-800">
                    <th scope="row" className="py-1 pr-3 font-normal">
                      {formatDeg(row.angleDeg, locale, { places: 1 })}
                    </th>
                    <td className="py-1 pr-3" data-testid={`arc-${index}`}>
                      {formatDecimal(mmToUnit(row.arcMm, unit), locale, { places })}
                    </td>
                    <td className="py-1 pr-3" data-testid={`chord-${index}`}>
                      {formatDecimal(mmToUnit(row.chordMm, unit), locale, { places })}
                    </td>
                  </tr>
                ))}
              </tbody>
            </table>
            <p className="text-xs text-steel-500">Arc = π·D·θ/360; chord = D·sin(θ/2).</p>
            <WheelLink href={scribeChartHref(result.diameterMm, result.anglesDeg)}>Print as a scribe chart</WheelLink>
          </>
        ) : (
          <WaitingForInput />
        )}
      </ResultPanel>
    </div>
  );
}
