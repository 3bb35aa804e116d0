'use client';

import { HydratedForm } from '@/components/hydrated-form';
import { LengthField } from '@/components/calculators/length-field';
import { UnitSwitch } from '@/components/calculators/unit-switch';
import { useEffect, useRef, useState } from 'react';
import { FormProvider, useForm, useFormContext, useWatch, type Resolver } from 'react-hook-form';
import { PAPER_NAMES } from '@/lib/sheet/paper';
import type { IgnoredParam } from '@/lib/generator-prefill';
import type { SheetKind, SheetRequest } from '@/lib/sheet/sheet-request';
import { CheckboxField, ChoiceGroup, FormSection, NumberField, SelectField, TextField, fieldId, inputClass, useFieldError, FieldErrorText, HelpText } from './fields';
import { toSheetRequestInput, usesField, DEFAULT_FORM_VALUES, type GeneratorFormValues, type LengthUnit } from './form-values';
import { forgetSheet, useSheetUrl } from './use-sheet-url';
import { DownloadPanel, type WorkspacePrinterProfiles } from './download-panel';
import { PortEventsField } from './port-events-field';
import { SheetPreview } from './sheet-preview';
import { PrintAtActualSize, SafetyPanel } from './safety-panel';

const KIND_OPTIONS = [
  { value: 'wheel', label: 'Degree wheel', hint: 'A disc for the flywheel face' },
  { value: 'ring', label: 'Flange ring', hint: 'A ring for the magneto flange or stator plate' },
  { value: 'strip', label: 'Rim strip', hint: 'A tape around the flywheel rim' },
  { value: 'scribe', label: 'Scribe chart', hint: 'Distances for marking the flywheel with dividers' },
  { value: 'check', label: 'Scale check', hint: 'Bars and a card outline to test a printer' },
] as const;

const DIAMETER_HELP: Partial<Record<SheetKind, React.ReactNode>> = {
  wheel: (
    <>
      Measure the flywheel <strong>face</strong> diameter: across the flat face the disc is stuck to, with calipers.
    </>
  ),
  strip: (
    <>
      Measure the flywheel <strong>rim</strong> outer diameter with calipers, where the strip will sit. The strip is π·(D + paper
      thickness) long.
    </>
  ),
  scribe: 'The diameter of the circle you will mark along: usually the flywheel rim outer diameter.',
};

/** The labels of the fields named in the sheet request's field table (the page reads the table on the server). */
export type FieldLabels = Record<'diameterMm' | 'hubHoleMm' | 'innerDiameterMm' | 'outerDiameterMm' | 'stripWidthMm' | 'targetAdvanceDeg' | 'strobeReadable', string>;

/**
 * The form's validation, with the shared schema and zod, is loaded on the first check (a change, a unit switch, a
 * download), not with the page: a first visit to the sheet maker downloads no schema library.
 */
const generatorResolver: Resolver<GeneratorFormValues, unknown, SheetRequest> = async (values, context, options) =>
  (await import('./generator-resolver')).generatorResolver(values, context, options);

/** The sheet generator: form on the left, live preview and downloads on the right. */
export function GeneratorForm({
  defaultValues,
  fieldLabels,
  ignored,
  notices = [],
  workspace = null,
}: {
  defaultValues: GeneratorFormValues;
  fieldLabels: FieldLabels;
  ignored: IgnoredParam[];
  /** What the link did to the sheet (lib/sheet-link.ts): restored, added to, a note rewritten. */
  notices?: string[];
  workspace?: WorkspacePrinterProfiles | null;
}) {
  const form = useForm<GeneratorFormValues, unknown, SheetRequest>({
    defaultValues,
    resolver: generatorResolver,
    mode: 'onChange',
  });
  const values = useWatch({ control: form.control }) as GeneratorFormValues;
  const request = toSheetRequestInput({ ...defaultValues, ...values });
  useCarrierFollowsKind(form, values.kind);
  useSheetUrl({ ...defaultValues, ...values }, defaultValues, form.reset);
  const [shownNotices, setShownNotices] = useState(notices);
  const startOver = () => {
    forgetSheet();
    setShownNotices([]);
    form.reset(DEFAULT_FORM_VALUES);
  };

  const validate = (onValid: (request: SheetRequest) => void, onInvalid: () => void) => form.handleSubmit(onValid, onInvalid)();
  // Below the lg breakpoint the form and the preview share the screen in turns; the bar that switches them stays on top.
  const [pane, setPane] = useState<Pane>('settings');

  return (
    <FormProvider {...form}>
      <PaneSwitch pane={pane} onChange={setPane} />
      <div className="grid gap-6 lg:grid-cols-[minmax(0,1fr)_minmax(0,1.05fr)]">
        <div className={`min-w-0 ${pane === 'preview' ? 'hidden lg:block' : ''}`}>
        <HydratedForm noValidate onSubmit={(e) => e.preventDefault()} aria-label="Sheet settings" className="space-y-4">
          <LinkNotices notices={shownNotices} onStartOver={startOver} />
          {ignored.length > 0 ? <IgnoredParams ignored={ignored} /> : null}
          <FormSection title="Sheet">
            <ChoiceGroup<GeneratorFormValues> name="kind" legend="What to print" options={KIND_OPTIONS} />
          </FormSection>
          {values.kind !== 'check' ? <MeasurementsSection kind={values.kind} unit={values.lengthUnit} labels={fieldLabels} /> : null}
          {usesField(values.kind, 'carrier') ? <ScaleSection numbering={values.numbering} /> : null}
          {usesField(values.kind, 'advanceMarksDeg') ? <AdvanceSection labels={fieldLabels} /> : null}
          {values.kind === 'scribe' ? <ScribeSection /> : null}
          <PaperSection kind={values.kind} />
          <button
            type="button"
            onClick={startOver}
            className="min-h-11 rounded-md border border-steel-300 px-4 text-sm font-medium hover:bg-steel-100 dark:border-steel-600 dark:hover:bg-steel-800"
          >
            Start a new sheet
          </button>
        </HydratedForm>
        </div>

        <div id="sheet-preview-pane" className={`min-w-0 space-y-4 lg:sticky lg:top-4 lg:self-start ${pane === 'settings' ? 'hidden lg:block' : ''}`}>
          <SheetPreview request={request} formValues={{ ...defaultValues, ...values }} />
          <PrintAtActualSize />
          <DownloadPanel validate={validate} workspace={workspace} />
          <SafetyPanel />
        </div>
      </div>
    </FormProvider>
  );
}

type Pane = 'settings' | 'preview';

/** The phone's two-way switch between the settings and the preview, pinned to the top of the screen. */
function PaneSwitch({ pane, onChange }: { pane: Pane; onChange: (pane: Pane) => void }) {
  const button = (value: Pane, label: string) => (
    <button
      type="button"
      aria-pressed={pane === value}
      onClick={() => {
        onChange(value);
        window.scrollTo({ top: 0 });
      }}
      className="min-h-11 flex-1 rounded-md px-3 text-sm font-semibold aria-pressed:bg-gauge-600 aria-pressed:text-white"
    >
      {label}
    </button>
  );
  return (
    <div
      role="group"
      aria-label="Show"
      className="sticky top-0 z-20 -mx-4 mb-4 flex gap-2 border-b border-steel-200 bg-steel-50/95 px-4 py-2 backdrop-blur lg:hidden dark:border-steel-800 dark:bg-steel-950/95"
    >
      {button('settings', 'Settings')}
      {button('preview', 'Preview and download')}
    </div>
  );
}

/** A disc turns with the flywheel; a flange ring sits still. Switch the carrier with the kind, once per change. */
function useCarrierFollowsKind(form: ReturnType<typeof useForm<GeneratorFormValues, unknown, SheetRequest>>, kind: SheetKind) {
  const previous = useRef(kind);
  useEffect(() => {
    if (previous.current === kind) return;
    previous.current = kind;
    if (kind === 'wheel') form.setValue('carrier', 'rotating');
    if (kind === 'ring') form.setValue('carrier', 'stationary');
  }, [form, kind]);
}

function LinkNotices({ notices, onStartOver }: { notices: string[]; onStartOver: () => void }) {
  if (notices.length === 0) return null;
  return (
    <div role="status" className="rounded-md border border-gauge-500/40 bg-gauge-500/5 p-3 text-sm text-steel-800 dark:text-steel-200">
      <ul className="space-y-0.5">
        {notices.map((notice) => (
          <li key={notice}>{notice}</li>
        ))}
      </ul>
      <button type="button" onClick={onStartOver} className="mt-1 min-h-11 text-sm font-medium text-gauge-700 underline dark:text-gauge-300">
        Start a new sheet instead
      </button>
    </div>
  );
}

function IgnoredParams({ ignored }: { ignored: IgnoredParam[] }) {
  return (
    <div role="status" className="rounded-md border border-spark-400/60 bg-spark-400/10 p-3 text-sm text-steel-800 dark:text-steel-200">
      <p className="font-medium">Some values in the link were not used:</p>
      <ul className="mt-1 list-disc pl-5 text-xs">
        {ignored.map((item, i) => (
          <li key={`${item.param}-${i}`}>{item.message}</li>
        ))}
      </ul>
    </div>
  );
}

function UnitToggle() {
  const { getValues, setValue, trigger } = useFormContext<GeneratorFormValues>();
  const unit = useWatch<GeneratorFormValues, 'lengthUnit'>({ name: 'lengthUnit' });
  // The values stay in mm; the length fields show them in the new unit and their messages are restated in it.
  const choose = (to: LengthUnit) => {
    if (getValues('lengthUnit') === to) return;
    setValue('lengthUnit', to);
    void import('@/lib/sheet/sheet-request').then(({ LENGTH_KEYS }) =>
      trigger(LENGTH_KEYS.filter((field) => field in getValues()) as Array<keyof GeneratorFormValues>),
    );
  };
  return <UnitSwitch unit={unit} onChange={choose} idPrefix="sheet" caption={null} inchLabel="in" className="gap-1 text-xs" />;
}

function MeasurementsSection({ kind, unit, labels }: { kind: SheetKind; unit: LengthUnit; labels: FieldLabels }) {
  return (
    <FormSection title="Measurements" aside={<UnitToggle />}>
      {kind === 'ring' ? (
        <div className="grid gap-4 sm:grid-cols-2">
          <LengthField<GeneratorFormValues>
            name="outerDiameterMm"
            label={labels.outerDiameterMm}
            unit={unit}
            help="Measure the magneto flange or stator plate diameter with calipers."
          />
          <LengthField<GeneratorFormValues>
            name="innerDiameterMm"
            label={labels.innerDiameterMm}
            unit={unit}
            help="Inner = flywheel outer diameter + clearance (about 1–2 mm), so the flywheel’s mark reads at the inner edge."
          />
        </div>
      ) : (
        <div className="grid gap-4 sm:grid-cols-2">
          <LengthField<GeneratorFormValues> name="diameterMm" label={labels.diameterMm} unit={unit} help={DIAMETER_HELP[kind]} className="sm:col-span-2" />
          {kind === 'wheel' ? (
            <LengthField<GeneratorFormValues> name="hubHoleMm" label={labels.hubHoleMm} unit={unit} help="For the crank nut or boss; 0 for none." />
          ) : null}
          {kind === 'strip' ? (
            <>
              <LengthField<GeneratorFormValues> name="stripWidthMm" label={labels.stripWidthMm} unit={unit} help="6–40 mm; what fits the rim." />
              <NumberField<GeneratorFormValues>
                name="paperThicknessMm"
                label="Paper thickness"
                unit="mm"
                step={0.01}
                help="Office paper ≈ 0.10 mm; label stock 0.15–0.20 mm."
              />
            </>
          ) : null}
        </div>
      )}
    </FormSection>
  );
}

function ScaleSection({ numbering }: { numbering: 'split' | 'full' }) {
  const kind = useWatch<GeneratorFormValues, 'kind'>({ name: 'kind' });
  return (
    <FormSection title="Scale">
      <ChoiceGroup<GeneratorFormValues>
        name="carrier"
        legend="Where the scale sits"
        options={[
          { value: 'rotating', label: 'Turns with the flywheel', hint: 'Read against a fixed pointer on the casing' },
          { value: 'stationary', label: 'Fixed to the casing or flange', hint: 'Read against the flywheel’s own mark' },
        ]}
        help={
          <>
            A disc on the face or a strip on the rim turns with the flywheel; a flange ring or a strip on the casing stays still.{' '}
            <strong className="text-spark-700 dark:text-spark-400">Choosing the wrong one puts the marks after TDC instead of before.</strong>
          </>
        }
      />
      <ChoiceGroup<GeneratorFormValues>
        name="rotation"
        legend="Rotation"
        options={[
          { value: 'cw', label: 'Clockwise' },
          { value: 'ccw', label: 'Counter-clockwise' },
        ]}
        help="The way the flywheel turns, as seen from the side the scale is mounted on."
      />
      <ChoiceGroup<GeneratorFormValues>
        name="numbering"
        legend="Numbering"
        options={[
          { value: 'split', label: 'From TDC both ways', hint: '0–180, halves marked BTDC and ATDC: ignition' },
          { value: 'full', label: 'Full circle', hint: '0–359 in crank order: port timing' },
        ]}
      />
      {numbering === 'full' ? <PortEventsField /> : null}
      {kind === 'strip' ? <StripLayoutFields /> : null}
      <NumberField<GeneratorFormValues>
        name="minPitchMm"
        label="Minimum legible pitch"
        unit="mm"
        step={0.1}
        help="Graduations closer together than this are left out, and the sheet says which."
      />
    </FormSection>
  );
}

function StripLayoutFields() {
  return (
    <div className="space-y-4">
      <NumberField<GeneratorFormValues>
        name="seamCrankDeg"
        label="Seam at crank angle"
        unit="°"
        help="Where the ends of the strip meet. 180 (BDC) keeps the ignition region unbroken."
      />
      <PairField
        name="windowCrankDeg"
        legend="Window (optional)"
        unit="°"
        labels={['From crank angle', 'To crank angle']}
        help="Only part of the scale, e.g. for a fan-cowl inspection hole. Crank angles: 0 = TDC, x° BTDC = 360 − x, so 40° BTDC to 10° ATDC is 320 to 10. Blank for the whole rim."
      />
    </div>
  );
}

function AdvanceSection({ labels }: { labels: FieldLabels }) {
  return (
    <FormSection title="Ignition advance">
      <TextField<GeneratorFormValues>
        name="advanceMarksDeg"
        label="Advance marks (° BTDC)"
        placeholder="16, 17, 18, 19, 20"
        mono
        help="Angles before TDC, separated by commas. Each is drawn long and heavy and labelled, e.g. “18° BTDC”. Use the figure from the engine maker’s manual."
      />
      <PairField
        name="advanceBandDeg"
        legend="Advance band (optional)"
        unit="° BTDC"
        labels={['From', 'To']}
        help="A hatched range that shows on a mono laser printer, e.g. 16 to 20. Blank for none."
      />
      <NumberField<GeneratorFormValues>
        name="targetAdvanceDeg"
        label={labels.targetAdvanceDeg}
        unit="° BTDC"
        step={0.5}
        help="The figure the engine is set to. Its mark is drawn heavier, with a filled wedge, and named as the target. Blank for none."
      />
      <CheckboxField<GeneratorFormValues>
        name="strobeReadable"
        label={labels.strobeReadable}
        hint="For timing a running engine with a strobe light"
        help="Big heavy figures every 2° or 5° across the advance band (or the marks) on a white ground, at least 5 mm tall where the piece is big enough; the sheet says when it is not. Fine graduations are kept only there."
      />
    </FormSection>
  );
}

function ScribeSection() {
  return (
    <FormSection title="Chart range">
      <div className="grid gap-4 sm:grid-cols-3">
        <NumberField<GeneratorFormValues> name="fromDeg" label="From" unit="°" />
        <NumberField<GeneratorFormValues> name="toDeg" label="To" unit="°" />
        <NumberField<GeneratorFormValues> name="stepDeg" label="Step" unit="°" step={0.1} />
      </div>
      <p className="text-xs text-steel-500 dark:text-steel-400">
        Each row gives the arc length along the rim from TDC (π·D·θ/360) and the chord (D·sin(θ/2)) to 0.01 mm, for setting dividers.
      </p>
    </FormSection>
  );
}

function PaperSection({ kind }: { kind: SheetKind }) {
  return (
    <FormSection title={kind === 'check' ? 'Paper' : 'Paper and title'}>
      <div className="grid gap-4 sm:grid-cols-2">
        <SelectField<GeneratorFormValues> name="paper" label="Paper" options={PAPER_NAMES.map((name) => ({ value: name, label: name }))} />
        <SelectField<GeneratorFormValues>
          name="orientation"
          label="Orientation"
          options={[
            { value: 'portrait', label: 'Portrait' },
            { value: 'landscape', label: 'Landscape' },
          ]}
        />
      </div>
      <TextField<GeneratorFormValues> name="title" label="Title" maxLength={80} placeholder="e.g. Bench engine, left side" help="Printed in the title block." />
      <TextField<GeneratorFormValues> name="note" label="Note (optional)" maxLength={200} />
    </FormSection>
  );
}

function PairField({
  name,
  legend,
  unit,
  labels,
  help,
}: {
  name: 'windowCrankDeg' | 'advanceBandDeg';
  legend: string;
  unit: string;
  labels: [string, string];
  help: string;
}) {
  const { register } = useFormContext<GeneratorFormValues>();
  const error = useFieldError(name);
  const id = fieldId(name);
  return (
    <fieldset className="space-y-1" aria-describedby={`${id}-help ${id}-error`}>
      <legend className="mb-1 text-sm font-medium text-steel-800 dark:text-steel-200">{legend}</legend>
      <div className="grid grid-cols-2 gap-3">
        {([0, 1] as const).map((index) => (
          <div key={index} className="space-y-1">
            <label htmlFor={`${id}-${index}`} className="block text-xs text-steel-600 dark:text-steel-300">
              {labels[index]}
            </label>
            <div className="relative">
              <input
                id={`${id}-${index}`}
                type="number"
                inputMode="decimal"
                step="any"
                aria-invalid={error ? true : undefined}
                aria-describedby={`${id}-help ${id}-error`}
                className={`${inputClass} pr-16 font-mono`}
                {...register(`${name}.${index}`, { valueAsNumber: true })}
              />
              <span className="pointer-events-none absolute inset-y-0 right-3 flex items-center font-mono text-xs text-steel-500">{unit}</span>
            </div>
          </div>
        ))}
      </div>
      <HelpText id={`${id}-help`}>{help}</HelpText>
      <FieldErrorText id={`${id}-error`} message={error} />
    </fieldset>
  );
}
