import { z } from 'zod';
import { numberField } from '@/lib/fields/builders';
import { defineFields, shapeOf } from '@/lib/fields/field';
import { DEFAULT_TOLERANCE_DEG } from './build-results';

/** A workspace's settings for its build records, declared once like every field. */
export const buildSettingsFields = defineFields({
  toleranceDeg: numberField({
    label: 'Port duration tolerance',
    min: 0.5,
    max: 10,
    unit: '°',
    column: 'build_tolerance_deg',
    help: `A measured port duration within ± this many degrees of the template’s target counts as on target (±${DEFAULT_TOLERANCE_DEG}° is common practice)`,
  }),
});

export const buildSettingsSchema = z.object(shapeOf(buildSettingsFields)).strict();
export type BuildSettings = z.output<typeof buildSettingsSchema>;
