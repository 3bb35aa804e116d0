'use client';

import { HydratedForm } from '@/components/hydrated-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { FormProvider, useForm, useWatch } from 'react-hook-form';
import { ChoiceGroup, NumberField } from '@/components/generator/fields';
import { crankOrderDeg, tdcFromStops, type TdcResult } from '@/lib/engine/tdc-from-stops';
import { tdcSchema, type TdcInput, type TdcRequest } from '@/lib/engine/tdc-schema';
import { tdcNoteHref } from '@/lib/engine/wheel-links';
import { formatDeg } from '@/lib/format/number-format';
import { useReaderLocale } from '@/components/format/reader-locale';
import { ResultFigure, ResultPanel, WaitingForInput } from './result-panel';
import { StopSketch } from './stop-sketch';
import { useLiveResult } from './use-live-result';
import { WheelLink } from './wheel-link';

const SIDE_OPTIONS = [
  { value: 'BTDC', label: 'BTDC' },
  { value: 'ATDC', label: 'ATDC' },
] as const;

/** One stop's reading, and on a split wheel the side of TDC it was read on. */
function StopReading({ stop, which, split }: { stop: 'A' | 'B'; which: string; split: boolean }) {
  return (
    <div className="space-y-2">
      <NumberField<TdcInput>
        name={`reading${stop}Deg`}
        label={`Reading ${stop} (${which})`}
        unit="°"
        help={split ? '0–180, as the pointer reads it.' : '0–360, as the pointer reads it.'}
      />
      {split ? <ChoiceGroup<TdcInput> name={`reading${stop}Side`} legend={`Reading ${stop} is on the`} options={SIDE_OPTIONS} /> : null}
    </div>
  );
}

/** Two positive-stop readings → where TDC really reads on the wheel, and how to correct it. */
export function TdcCalculator() {
  const form = useForm<TdcInput, unknown, TdcRequest>({
    resolver: zodResolver(tdcSchema),
    defaultValues: { numbering: 'split', readingADeg: 24, readingASide: 'BTDC', readingBDeg: 28, readingBSide: 'ATDC' },
    mode: 'onChange',
  });
  const numbering = useWatch({ control: form.control, name: 'numbering' });
  const result = useLiveResult(form.control, tdcSchema, (valid) => ({
    ...tdcFromStops(valid),
    stopACrankDeg: crankOrderDeg(valid.readingADeg, valid.numbering, valid.readingASide),
    stopBCrankDeg: crankOrderDeg(valid.readingBDeg, valid.numbering, valid.readingBSide),
  }));
  const split = numbering === 'split';

  return (
    <div className="grid gap-6 lg:grid-cols-[1fr_minmax(0,22rem)]">
      <FormProvider {...form}>
        <HydratedForm noValidate onSubmit={form.handleSubmit(() => undefined)} aria-label="Positive stop readings" className="space-y-4">
          <ChoiceGroup<TdcInput>
            name="numbering"
            legend="How the wheel is numbered"
            options={[
              { value: 'split', label: 'Split', hint: '0 at TDC, up to 180 each way (BTDC and ATDC halves)' },
              { value: 'full', label: 'Full', hint: '0–359 in crank order' },
            ]}
          />
          <div className="grid gap-4 sm:grid-cols-2">
            <StopReading stop="A" which="first stop" split={split} />
            <StopReading stop="B" which="other stop" split={split} />
          </div>
          <div className="rounded-md bg-steel-100 p-3 text-sm text-steel-700 dark:bg-steel-800 dark:text-steel-200">
            <p className="font-semibold">Quicker habit: read the sweep and halve it</p>
            <p className="mt-1">
              Turn the crank by hand to one stop and set the wheel to read 0 there. Turn the other way to the second stop
              and read the sweep. TDC is half the sweep from either stop. Choose “Full”, enter 0 for A and the sweep for B.
            </p>
          </div>
        </HydratedForm>
      </FormProvider>
      <div className="space-y-4">
        <ResultPanel title="True TDC" id="tdc-result">
          {result ? <TdcAnswer result={result} /> : <WaitingForInput />}
        </ResultPanel>
        {result ? <StopSketch stopACrankDeg={result.stopACrankDeg} stopBCrankDeg={result.stopBCrankDeg} tdcCrankDeg={result.tdcCrankOrderDeg} /> : null}
      </div>
    </div>
  );
}

function TdcAnswer({ result }: { result: TdcResult }) {
  const locale = useReaderLocale();
  const reading =
    result.tdcReadingSide === null || result.tdcReadingSide === 'TDC'
      ? formatDeg(result.tdcReadingDeg, locale, { places: 1 })
      : `${formatDeg(result.tdcReadingDeg, locale, { places: 1 })} ${result.tdcReadingSide}`;
  const amount = formatDeg(Math.abs(result.correctionDeg), locale, { places: 1 });
  const correction =
    result.correctionDeg === 0
      ? 'None: the wheel already reads 0 at TDC.'
      : `With the crank at TDC, move the pointer ${amount} toward the ${result.correctionDeg > 0 ? 'ATDC' : 'BTDC'} side (or turn the wheel on its shaft ${amount} the other way) until it reads 0.`;
  return (
    <>
      <ResultFigure label="The wheel reads at true TDC" value={reading} testId="tdc-reading" />
      <ResultFigure label="Correction" value={`${result.correctionDeg > 0 ? '+' : result.correctionDeg < 0 ? '−' : ''}${amount}`} detail={correction} testId="tdc-correction" />
      <ResultFigure
        label="Stop touches the piston at"
        value={`${formatDeg(result.stopAngleDeg, locale, { places: 1 })} either side`}
        detail={`Sweep across TDC ${formatDeg(result.sweepDeg, locale, { places: 1 })}, halved.`}
        testId="tdc-stop-angle"
      />
      <WheelLink href={tdcNoteHref(result)}>Put this on a wheel as a note</WheelLink>
    </>
  );
}
