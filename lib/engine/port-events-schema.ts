import { z } from 'zod';
import { choiceField, lengthField, listField, textField } from '../fields/builders';
import { defineFields, shapeOf } from '../fields/field';
import { DECK_RANGE_MM, MAX_CALC_PORTS, PORT_HEIGHT_RANGE_MM, checkOffsetCrankGeometry, crankFields } from './calc-fields';
import { PORT_KINDS } from './port-kind';

export const calcPortFields = defineFields({
  name: textField({ label: 'Port name', minLength: 1, maxLength: 24 }),
  heightMm: lengthField({ label: 'Port edge height', ...PORT_HEIGHT_RANGE_MM }),
  kind: choiceField({ label: 'Port kind', choices: PORT_KINDS }).optional(),
});

const calcPortSchema = z.object(shapeOf(calcPortFields));

export const portEventsFields = defineFields({
  strokeMm: crankFields.strokeMm,
  rodMm: crankFields.rodMm,
  deckMm: lengthField({ label: 'Deck height', ...DECK_RANGE_MM }),
  pinOffsetMm: crankFields.pinOffsetMm,
  ports: listField(
    { label: 'Ports' },
    z
      .array(calcPortSchema, { error: 'Ports must be a list of { name, heightMm }' })
      .min(1, `Ports: give 1–${MAX_CALC_PORTS} ports`)
      .max(MAX_CALC_PORTS, `Ports: at most ${MAX_CALC_PORTS} (allowed 1–${MAX_CALC_PORTS})`),
  ),
});

/** POST /api/v1/calc/port-events and the port timing form. */
export const portEventsSchema = z
  .object(shapeOf(portEventsFields))
  .superRefine((value, ctx) => {
    checkOffsetCrankGeometry(value, ctx);
  });

export type PortEventsInput = z.input<typeof portEventsSchema>;
export type PortEventsRequest = z.output<typeof portEventsSchema>;
