'use client';

import type { LengthUnit } from '@/lib/fields/length';

type UnitSwitchProps = {
  unit: LengthUnit;
  onChange: (unit: LengthUnit) => void;
  idPrefix: string;
  /** Visible caption before the buttons; null for none. */
  caption?: string | null;
  inchLabel?: string;
  className?: string;
};

/** mm / inch switch shared by the calculators and the sheet maker (two radio buttons, arrow keys move between them). */
export function UnitSwitch({ unit, onChange, idPrefix, caption = 'Units', inchLabel = 'inch', className = 'gap-2 text-sm' }: UnitSwitchProps) {
  return (
    <fieldset className={`flex items-center ${className}`}>
      <legend className="sr-only">Length unit</legend>
      {caption ? (
        <span aria-hidden className="text-xs font-semibold uppercase tracking-wider text-steel-500">
          {caption}
        </span>
      ) : null}
      {(['mm', 'in'] as const).map((option) => (
        <label
          key={option}
          htmlFor={`${idPrefix}-unit-${option}`}
          className="cursor-pointer rounded border border-steel-300 px-2 py-0.5 font-mono has-[:checked]:border-gauge-600 has-[:checked]:bg-gauge-600 has-[:checked]:text-white has-[:focus-visible]:ring-2 has-[:focus-visible]:ring-gauge-500/40 dark:border-steel-600"
        >
          <input
            id={`${idPrefix}-unit-${option}`}
            type="radio"
            name={`${idPrefix}-unit`}
            value={option}
            checked={unit === option}
            onChange={() => onChange(option)}
            className="sr-only"
          />
          {option === 'mm' ? 'mm' : inchLabel}
        </label>
      ))}
    </fieldset>
  );
}
