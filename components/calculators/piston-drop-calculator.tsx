'use client';

import { HydratedForm } from '@/components/hydrated-form';
import { useEffect, useRef, useState } from 'react';
import { FormProvider, useForm } from 'react-hook-form';
import { NumberField } from '@/components/generator/fields';
import { crankAngleFields, crankAngleSchema, type CrankAngleInput, type CrankAngleRequest } from '@/lib/engine/crank-angle-schema';
import { pistonDropFields, pistonDropSchema, type PistonDropInput, type PistonDropRequest } from '@/lib/engine/piston-drop-schema';
import { crankAnglesFromDropMm, offsetPistonDropMm } from '@/lib/engine/offset-slider-crank';
import { advanceMarkHref } from '@/lib/engine/wheel-links';
import { CrankDiagram } from './crank-diagram';
import { LengthField } from './length-field';
import { formatLength, type LengthUnit } from '@/lib/fields/length';
import { formatDeg } from '@/lib/format/number-format';
import { useReaderLocale } from '@/components/format/reader-locale';
import { ResultFigure, ResultPanel, WaitingForInput } from './result-panel';
import { shownUnitResolver, useRecheckOnUnit } from './shown-unit-resolver';
import { UnitSwitch } from './unit-switch';
import { useLiveResult } from './use-live-result';
import { WheelLink } from './wheel-link';

type Direction = 'angle-to-drop' | 'drop-to-angle';
type Geometry = { strokeMm: number; rodMm: number; pinOffsetMm: number };

const EXAMPLE: Geometry = { strokeMm: 54, rodMm: 105, pinOffsetMm: 0 };

/** Piston drop ⇄ crank angle: one direction at a time, the engine's stroke and rod carried across. */
export function PistonDropCalculator() {
  const [direction, setDirection] = useState<Direction>('angle-to-drop');
  const [unit, setUnit] = useState<LengthUnit>('mm');
  // The last valid stroke and rod, carried into the other direction when it is chosen.
  const geometry = useRef<Geometry>(EXAMPLE);
  const remember = (next: Geometry) => {
    geometry.current = next;
  };
  // What the newly chosen direction starts from: read from the ref when the choice is made, not during render.
  const [carried, setCarried] = useState<Geometry>(EXAMPLE);
  const choose = (next: Direction) => {
    setCarried(geometry.current);
    setDirection(next);
  };

  return (
    <div className="space-y-4">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <fieldset className="flex flex-wrap gap-2 text-sm">
          <legend className="sr-only">What you know</legend>
          {(
            [
              ['angle-to-drop', 'I know the crank angle → piston drop'],
              ['drop-to-angle', 'I know the drop → crank angle'],
            ] as const
          ).map(([value, label]) => (
            <label
              key={value}
              className="cursor-pointer rounded-md border border-steel-300 px-3 py-1.5 has-[:checked]:border-gauge-600 has-[:checked]:bg-gauge-500/10 has-[:focus-visible]:ring-2 has-[:focus-visible]:ring-gauge-500/40 dark:border-steel-600"
            >
              <input type="radio" name="direction" value={value} checked={direction === value} onChange={() => choose(value)} className="mr-2 accent-gauge-600" />
              {label}
            </label>
          ))}
        </fieldset>
        <UnitSwitch unit={unit} onChange={setUnit} idPrefix="drop" />
      </div>
      {direction === 'angle-to-drop' ? (
        <AngleToDrop geometry={carried} onGeometry={remember} unit={unit} />
      ) : (
        <DropToAngle geometry={carried} onGeometry={remember} unit={unit} />
      )}
    </div>
  );
}

type PartProps = { geometry: Geometry; onGeometry: (geometry: Geometry) => void; unit: LengthUnit };

function GeometryFields({ unit }: { unit: LengthUnit }) {
  return (
    <div className="grid gap-4 sm:grid-cols-3">
      <LengthField name="strokeMm" label="Stroke" unit={unit} help="Twice the crank throw (piston travel TDC to BDC with a centred pin)." />
      <LengthField name="rodMm" label="Con-rod length" unit={unit} help="Centre to centre, big end to small end." />
      <LengthField
        name="pinOffsetMm"
        label="Wrist-pin offset"
        unit={unit}
        help="0 for a centred pin. Measure from the piston's pin bore centre to the skirt's centre line. Positive when the pin sits toward the side the crank pin swings to just after TDC, negative toward the other side. −5 to 5 mm."
      />
    </div>
  );
}

/** "12.3° ATDC" up to BDC, "x° BTDC" past it: the side matters once the pin is offset. */
function sideText(crankDeg: number, locale: string): string {
  return crankDeg <= 180 ? `${formatDeg(crankDeg, locale, { places: 1 })} ATDC` : `${formatDeg(360 - crankDeg, locale, { places: 1 })} BTDC`;
}

function AngleToDrop({ geometry, onGeometry, unit }: PartProps) {
  const locale = useReaderLocale();
  const form = useForm<PistonDropInput, unknown, PistonDropRequest>({
    resolver: shownUnitResolver(pistonDropSchema, pistonDropFields),
    context: { unit },
    defaultValues: { ...geometry, crankDeg: 18 },
    mode: 'onChange',
  });
  useRecheckOnUnit(form, unit);
  const result = useLiveResult(form.control, pistonDropSchema, (valid) => ({ ...valid, pinOffsetMm: valid.pinOffsetMm ?? 0, dropMm: offsetPistonDropMm(valid) }));
  useRememberGeometry(result, onGeometry);
  const offset = result !== null && result.pinOffsetMm !== 0;
  // Without an offset the drop is the same either side of TDC; with one only a before-TDC angle is a timing figure.
  const btdcDeg = result && (!offset || result.crankDeg > 180) ? Math.min(result.crankDeg, 360 - result.crankDeg) : null;

  return (
    <div className="grid gap-6 lg:grid-cols-[1fr_minmax(0,20rem)]">
      <FormProvider {...form}>
        <HydratedForm noValidate onSubmit={form.handleSubmit(() => undefined)} aria-label="Crank angle to piston drop" className="space-y-4">
          <GeometryFields unit={unit} />
          <NumberField<PistonDropInput>
            name="crankDeg"
            label="Crank angle from TDC"
            unit="°"
            help="0–360° in crank order: x° after TDC is x, x° before TDC is 360 − x (18° BTDC = 342). With a centred pin 18° BTDC and 18° ATDC give one drop; with an offset pin they differ."
          />
        </HydratedForm>
      </FormProvider>
      <div className="space-y-4">
        <ResultPanel title="Piston drop" id="drop-result">
          {result ? (
            <>
              <ResultFigure
                label={`Below TDC at ${formatDeg(result.crankDeg, locale, { places: 1 })}`}
                value={formatLength(result.dropMm, unit, locale)}
                detail={
                  btdcDeg !== null && btdcDeg <= 180
                    ? `= ${formatLength(result.dropMm, unit, locale)} BTDC for ${formatDeg(btdcDeg, locale, { places: 1 })} BTDC timing`
                    : offset
                      ? `${sideText(result.crankDeg, locale)}, on the down-stroke`
                      : undefined
                }
                testId="drop-value"
              />
              {btdcDeg !== null ? <WheelLink href={advanceMarkHref(btdcDeg)}>{`Mark ${formatDeg(btdcDeg, locale, { places: 1 })} BTDC on a wheel`}</WheelLink> : null}
            </>
          ) : (
            <WaitingForInput />
          )}
        </ResultPanel>
        {result ? <CrankDiagram strokeMm={result.strokeMm} rodMm={result.rodMm} crankDeg={result.crankDeg} pinOffsetMm={result.pinOffsetMm} unit={unit} /> : null}
      </div>
    </div>
  );
}

function DropToAngle({ geometry, onGeometry, unit }: PartProps) {
  const locale = useReaderLocale();
  const form = useForm<CrankAngleInput, unknown, CrankAngleRequest>({
    resolver: shownUnitResolver(crankAngleSchema, crankAngleFields),
    context: { unit },
    defaultValues: { ...geometry, dropMm: 1.8 },
    mode: 'onChange',
  });
  useRecheckOnUnit(form, unit);
  const result = useLiveResult(form.control, crankAngleSchema, (valid) => ({ ...valid, pinOffsetMm: valid.pinOffsetMm ?? 0, ...crankAnglesFromDropMm(valid) }));
  useRememberGeometry(result, onGeometry);

  return (
    <div className="grid gap-6 lg:grid-cols-[1fr_minmax(0,20rem)]">
      <FormProvider {...form}>
        <HydratedForm noValidate onSubmit={form.handleSubmit(() => undefined)} aria-label="Piston drop to crank angle" className="space-y-4">
          <GeometryFields unit={unit} />
          <LengthField<CrankAngleInput>
            name="dropMm"
            label="Piston drop below TDC"
            unit={unit}
            help="From the dial gauge, or the manual's figure (e.g. “1.8 mm before TDC”). 0 up to the stroke (a little more with an offset pin)."
          />
        </HydratedForm>
      </FormProvider>
      <div className="space-y-4">
        <ResultPanel title="Crank angle" id="angle-result">
          {result ? (
            <>
              {result.pinOffsetMm === 0 ? (
                <ResultFigure
                  label={`From TDC at ${formatLength(result.dropMm, unit, locale)} drop`}
                  value={formatDeg(result.crankDeg, locale, { places: 2 })}
                  detail={`${formatDeg(result.crankDeg, locale, { places: 2 })} BTDC on the way up, ${formatDeg(result.crankDeg, locale, { places: 2 })} ATDC on the way down`}
                  testId="angle-value"
                />
              ) : (
                <>
                  <ResultFigure
                    label={`Before TDC on the way up, at ${formatLength(result.dropMm, unit, locale)} drop`}
                    value={`${formatDeg(result.crankDegBTDC, locale, { places: 2 })} BTDC`}
                    detail="The offset pin makes the two sides of TDC differ: this is the one for ignition timing."
                    testId="angle-value"
                  />
                  <ResultFigure label="After TDC on the way down" value={`${formatDeg(result.crankDegATDC, locale, { places: 2 })} ATDC`} testId="angle-atdc-value" />
                </>
              )}
              <WheelLink href={advanceMarkHref(result.crankDegBTDC)}>{`Mark ${formatDeg(result.crankDegBTDC, locale, { places: 1 })} BTDC on a wheel`}</WheelLink>
            </>
          ) : (
            <WaitingForInput />
          )}
        </ResultPanel>
        {result ? (
          <CrankDiagram strokeMm={result.strokeMm} rodMm={result.rodMm} crankDeg={result.pinOffsetMm === 0 ? result.crankDeg : 360 - result.crankDegBTDC}
            pinOffsetMm={result.pinOffsetMm} unit={unit} />
        ) : null}
      </div>
    </div>
  );
}

function useRememberGeometry(result: Geometry | null, onGeometry: (geometry: Geometry) => void) {
  const strokeMm = result?.strokeMm;
  const rodMm = result?.rodMm;
  const pinOffsetMm = result?.pinOffsetMm;
  useEffect(() => {
    if (strokeMm !== undefined && rodMm !== undefined && pinOffsetMm !== undefined) onGeometry({ strokeMm, rodMm, pinOffsetMm });
  }, [strokeMm, rodMm, pinOffsetMm, onGeometry]);
}
