'use client';

import { useFieldArray, useFormContext } from 'react-hook-form';
import { MAX_PORT_EVENTS } from '@/lib/sheet/sheet-limits';
import { FieldErrorText, fieldId, inputClass, useFieldError } from './fields';
import type { GeneratorFormValues } from './form-values';

/** Port opening and closing marks for a full (0–359) scale. */
export function PortEventsField() {
  const { control, register } = useFormContext<GeneratorFormValues>();
  const { fields, append, remove } = useFieldArray({ control, name: 'portEvents' });
  const listError = useFieldError('portEvents');
  return (
    <fieldset className="space-y-2" aria-describedby="port-events-help port-events-error">
      <legend className="text-sm font-medium text-steel-800 dark:text-steel-200">Port events</legend>
      <p id="port-events-help" className="text-xs text-steel-500 dark:text-steel-400">
        Crank angles 0–360 (0 = TDC, in the direction of rotation): e.g. exhaust opens at 97 and closes at 263.
      </p>
      {fields.length > 0 ? (
        <table className="w-full text-left text-sm">
          <thead className="text-xs text-steel-500">
            <tr>
              <th scope="col" className="pb-1 font-medium">Port</th>
              <th scope="col" className="pb-1 font-medium">Opens °</th>
              <th scope="col" className="pb-1 font-medium">Closes °</th>
              <th scope="col" className="pb-1"><span className="sr-only">Remove</span></th>
            </tr>
          </thead>
          <tbody>
            {fields.map((field, index) => (
              <PortEventRow key={field.id} index={index} onRemove={() => remove(index)} register={register} />
            ))}
          </tbody>
        </table>
      ) : null}
      <button
        type="button"
        disabled={fields.length >= MAX_PORT_EVENTS}
        onClick={() => append({ name: '', opensCrankDeg: Number.NaN, closesCrankDeg: Number.NaN })}
        className="rounded-md border border-steel-300 px-3 py-1.5 text-xs font-medium text-steel-700 hover:bg-steel-100 disabled:opacity-50 dark:border-steel-600 dark:text-steel-200 dark:hover:bg-steel-800"
      >
        Add a port event
      </button>
      <FieldErrorText id="port-events-error" message={listError} />
    </fieldset>
  );
}

function PortEventRow({
  index,
  onRemove,
  register,
}: {
  index: number;
  onRemove: () => void;
  register: ReturnType<typeof useFormContext<GeneratorFormValues>>['register'];
}) {
  const names = {
    name: `portEvents.${index}.name`,
    opens: `portEvents.${index}.opensCrankDeg`,
    closes: `portEvents.${index}.closesCrankDeg`,
  } as const;
  const errors = [useFieldError(names.name), useFieldError(names.opens), useFieldError(names.closes)].filter(Boolean);
  const errorId = `${fieldId(`portEvents.${index}`)}-error`;
  return (
    <>
      <tr>
        <td className="pr-2 align-top">
          <input aria-label={`Port ${index + 1} name`} aria-describedby={errorId} className={inputClass} placeholder="Exhaust" {...register(names.name)} />
        </td>
        {(['opening', 'closing'] as const).map((event) => (
          <td key={event} className="pr-2 align-top">
            <input
              aria-label={`Port ${index + 1} ${event} angle`}
              aria-describedby={errorId}
              type="number"
              inputMode="decimal"
              step="any"
              className={`${inputClass} font-mono`}
              {...register(event === 'opening' ? names.opens : names.closes, { valueAsNumber: true })}
            />
          </td>
        ))}
        <td className="align-top">
          <button type="button" onClick={onRemove} className="rounded px-2 py-2 text-xs text-steel-600 hover:bg-steel-100 dark:text-steel-300 dark:hover:bg-steel-800">
            Remove<span className="sr-only"> port {index + 1}</span>
          </button>
        </td>
      </tr>
      <tr>
        <td colSpan={4}>
          <FieldErrorText id={errorId} message={errors.join(' · ') || undefined} />
        </td>
      </tr>
    </>
  );
}
