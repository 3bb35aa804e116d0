import { z } from 'zod';
import {
  DECK_RANGE_MM,
  MAX_CALC_PORTS,
  PORT_HEIGHT_RANGE_MM,
  checkOffsetCrankGeometry,
  numberField,
  pinOffsetField,
  rodField,
  strokeField,
} from './calc-fields';
import { PORT_KINDS } from './port-kind';

export const calcPortSchema = z.object({
  name: z
    .string({ error: 'Port name (name) must be text, 1–24 characters' })
    .trim()
    .min(1, 'Port name (name) must not be empty (1–24 characters)')
    .max(24, 'Port name (name) must be at most 24 characters'),
  heightMm: numberField('Port edge height', 'heightMm', PORT_HEIGHT_RANGE_MM.min, PORT_HEIGHT_RANGE_MM.max, 'mm'),
  kind: z.enum(PORT_KINDS, { error: `Port kind (kind) must be one of: ${PORT_KINDS.join(', ')}` }).optional(),
});

/** POST /api/v1/calc/port-events and the port timing form. */
export const portEventsSchema = z
  .object({
    strokeMm: strokeField(),
    rodMm: rodField(),
    deckMm: numberField('Deck height', 'deckMm', DECK_RANGE_MM.min, DECK_RANGE_MM.max, 'mm'),
    pinOffsetMm: pinOffsetField(),
    ports: z
      .array(calcPortSchema, { error: 'Ports (ports) must be a list of { name, heightMm }' })
      .min(1, `Ports (ports): give 1–${MAX_CALC_PORTS} ports`)
      .max(MAX_CALC_PORTS, `Ports (ports): at most ${MAX_CALC_PORTS} (allowed 1–${MAX_CALC_PORTS})`),
  })
  .superRefine((value, ctx) => {
    checkOffsetCrankGeometry(value, ctx);
  });

export type PortEventsInput = z.input<typeof portEventsSchema>;
export type PortEventsRequest = z.output<typeof portEventsSchema>;
