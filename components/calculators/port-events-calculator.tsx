'use client';

import { HydratedForm } from '@/components/hydrated-form';
import { useState } from 'react';
import { FormProvider, useFieldArray, useForm } from 'react-hook-form';
import { FieldErrorText, SelectField, TextField, fieldId } from '@/components/generator/fields';
import { MAX_CALC_PORTS } from '@/lib/engine/calc-fields';
import { portEvents, type PortTiming } from '@/lib/engine/port-events';
import { portEventsFields, portEventsSchema, type PortEventsInput, type PortEventsRequest } from '@/lib/engine/port-events-schema';
import { PORT_KINDS } from '@/lib/engine/port-kind';
import { portEventsWheelHref } from '@/lib/engine/wheel-links';
import { LengthField } from './length-field';
import { formatLength, type LengthUnit } from '@/lib/fields/length';
import { formatDeg } from '@/lib/format/number-format';
import { useReaderLocale } from '@/components/format/reader-locale';
import { PortRing } from './port-ring';
import { ResultPanel, WaitingForInput } from './result-panel';
import { shownUnitResolver, useRecheckOnUnit } from './shown-unit-resolver';
import { UnitSwitch } from './unit-switch';
import { useLiveResult } from './use-live-result';
import { WheelLink } from './wheel-link';

// Invented example figures for a small piston-port engine.
const EXAMPLE: PortEventsInput = {
  strokeMm: 54,
  rodMm: 105,
  deckMm: 0.6,
  pinOffsetMm: 0,
  ports: [
    { name: 'Exhaust', kind: 'exhaust', heightMm: 26.1 },
    { name: 'Transfer A', kind: 'transfer', heightMm: 38.4 },
    { name: 'Transfer B', kind: 'transfer', heightMm: 38.4 },
    { name: 'Boost', kind: 'boost', heightMm: 39 },
  ],
};

const KIND_OPTIONS = PORT_KINDS.map((kind) => ({ value: kind, label: kind[0]?.toUpperCase() + kind.slice(1) }));

/** Port heights and deck height → opening and closing angles, durations and blowdown. */
export function PortEventsCalculator() {
  const locale = useReaderLocale();
  const [unit, setUnit] = useState<LengthUnit>('mm');
  const form = useForm<PortEventsInput, unknown, PortEventsRequest>({
    resolver: shownUnitResolver(portEventsSchema, portEventsFields),
    context: { unit },
    defaultValues: EXAMPLE,
    mode: 'onChange',
  });
  useRecheckOnUnit(form, unit);
  const ports = useFieldArray({ control: form.control, name: 'ports' });
  const result = useLiveResult(form.control, portEventsSchema, (valid) => portEvents(valid));
  // The list-level message (no ports, too many) sits on the array itself.
  const listErrors = form.formState.errors.ports;
  const listError = listErrors?.root?.message ?? listErrors?.message;

  return (
    <div className="grid gap-6 xl:grid-cols-[minmax(0,1fr)_minmax(0,26rem)]">
      <FormProvider {...form}>
        <HydratedForm noValidate onSubmit={form.handleSubmit(() => undefined)} aria-label="Port heights" className="space-y-4">
          <div className="flex justify-end">
            <UnitSwitch unit={unit} onChange={setUnit} idPrefix="ports" />
          </div>
          <div className="grid gap-4 sm:grid-cols-2 lg:grid-cols-4">
            <LengthField<PortEventsInput> name="strokeMm" label="Stroke" unit={unit} />
            <LengthField<PortEventsInput> name="rodMm" label="Con-rod length" unit={unit} help="Centre to centre." />
            <LengthField<PortEventsInput>
              name="deckMm"
              label="Deck height"
              unit={unit}
              help="Crown below the cylinder top at TDC; negative when the crown stands proud."
            />
            <LengthField<PortEventsInput>
              name="pinOffsetMm"
              label="Wrist-pin offset"
              unit={unit}
              help="0 for a centred pin; positive toward the side the crank pin swings to just after TDC. With an offset, closing is not 360° − opening."
            />
          </div>
          <fieldset className="space-y-3">
            <legend className="text-sm font-semibold text-steel-800 dark:text-steel-200">Ports (top edge measured down from the cylinder top)</legend>
            {ports.fields.map((field, index) => (
              <div key={field.id} className="grid items-start gap-3 rounded-md border border-steel-200 p-3 sm:grid-cols-[2rem_1fr_9rem_1fr_auto] dark:border-steel-700">
                <span aria-hidden className="pt-8 font-mono text-sm text-steel-500">
                  {index + 1}
                </span>
                <TextField<PortEventsInput> name={`ports.${index}.name`} label={`Port ${index + 1} name`} maxLength={24} />
                <SelectField<PortEventsInput> name={`ports.${index}.kind`} label="Kind" options={KIND_OPTIONS} />
                <LengthField<PortEventsInput> name={`ports.${index}.heightMm`} label={`Port ${index + 1} edge height`} unit={unit} />
                <button
                  type="button"
                  onClick={() => ports.remove(index)}
                  disabled={ports.fields.length <= 1}
                  className="mt-6 rounded border border-steel-300 px-2 py-1.5 text-sm hover:bg-steel-100 disabled:opacity-40 dark:border-steel-600 dark:hover:bg-steel-800"
                  aria-label={`Remove port ${index + 1}`}
                >
                  Remove
                </button>
              </div>
            ))}
            <FieldErrorText id={`${fieldId('ports')}-error`} message={listError} />
            <button
              type="button"
              onClick={() => ports.append({ name: `Port ${ports.fields.length + 1}`, kind: 'other', heightMm: 30 })}
              disabled={ports.fields.length >= MAX_CALC_PORTS}
              className="min-h-11 rounded-md border border-gauge-600 px-3 text-sm font-medium text-gauge-700 hover:bg-gauge-500/10 disabled:opacity-40 dark:text-gauge-500"
            >
              Add a port
            </button>
          </fieldset>
          <p className="text-xs text-steel-500 dark:text-steel-400">
            Every port here is taken as opened and closed by the piston crown. The inlet of a piston-port engine is really
            uncovered by the skirt near TDC, which this page does not model: time that one on the engine with a wheel.
          </p>
        </HydratedForm>
      </FormProvider>
      <div className="space-y-4">
        <ResultPanel title="Port timing" id="port-result">
          {result ? (
            <>
              <table className="w-full text-left text-sm tabular-nums">
                <caption className="sr-only">Opening and closing angles of each port</caption>
                <thead className="text-xs text-steel-500">
                  <tr>
                    <th scope="col" className="pr-3">#</th>
                    <th scope="col" className="pr-3">Port</th>
                    <th scope="col" className="pr-3">Opens ATDC</th>
                    <th scope="col" className="pr-3">Closes ATDC</th>
                    <th scope="col" className="pr-3">Duration</th>
                  </tr>
                </thead>
                <tbody className="font-mono">
                  {result.ports.map((port, index) => (
                    <tr key={`${port.name}-${index}`} className="border-t border-steel-100 align-top dark:border-steel-800">
                      <td className="py-1 pr-3 text-steel-500">{index + 1}</td>
                      <th scope="row" className="py-1 pr-3 font-sans font-medium">
                        {port.name}
                        <span className="block text-xs font-normal text-steel-500">{portNote(port, unit, locale)}</span>
                      </th>
                      <td className="py-1 pr-3">{port.opensDegATDC === null ? '—' : formatDeg(port.opensDegATDC, locale, { places: 1 })}</td>
                      <td className="py-1 pr-3">{port.closesDegATDC === null ? '—' : formatDeg(port.closesDegATDC, locale, { places: 1 })}</td>
                      <td className="py-1 pr-3" data-testid={`duration-${index}`}>
                        {formatDeg(port.durationDeg, locale, { places: 1 })}
                      </td>
                    </tr>
                  ))}
                </tbody>
              </table>
              <p className="text-sm">
                <span className="font-semibold">Blowdown: </span>
                <span className="font-mono" data-testid="blowdown">
                  {result.blowdownDeg === null ? '—' : formatDeg(result.blowdownDeg, locale, { places: 1 })}
                </span>{' '}
                <span className="text-xs text-steel-500">{result.blowdownNote}</span>
              </p>
              <WheelLink href={portEventsWheelHref(result.ports)}>Use on a wheel (full numbering)</WheelLink>
            </>
          ) : (
            <WaitingForInput />
          )}
        </ResultPanel>
        {result ? <PortRing ports={result.ports} /> : null}
      </div>
    </div>
  );
}

/** The port's note in the unit on screen. */
function portNote(port: PortTiming, unit: LengthUnit, locale: string): string {
  const drop = formatLength(port.openingDropMm, unit, locale);
  if (port.status === 'opens') return `Opens ${drop} below TDC`;
  if (port.status === 'open-at-tdc') return 'Open at TDC: the edge is level with or above the crown at TDC';
  return `Never opens: the edge is ${drop} below the crown at TDC, at or past the stroke`;
}
