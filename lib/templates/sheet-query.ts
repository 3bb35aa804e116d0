import { choiceField } from '@/lib/fields/builders';
import { defineFields, shapeOf } from '@/lib/fields/field';
import { TEMPLATE_SHEET_KINDS } from './template-sheet';

/** `?kind=&format=` of the sheet routes of a stored template or build record; without `kind`, the first the diameters allow. */
const storedSheetQueryFields = defineFields({
  kind: choiceField({ label: 'Sheet kind', choices: TEMPLATE_SHEET_KINDS }).optional(),
  format: choiceField({ label: 'Format', choices: ['pdf', 'svg'] }).default('pdf'),
});
export const storedSheetQueryShape = shapeOf(storedSheetQueryFields);
