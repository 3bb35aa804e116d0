import 'server-only';
import { z } from 'zod';
import { choiceField } from '@/lib/fields/builders';

/** `?format=pdf&paper=A4|Letter` of the customer's copy and of its send. */
export const copyQuerySchema = z.object({
  format: choiceField({ label: 'Format', choices: ['pdf'] }).default('pdf').schema,
  paper: choiceField({ label: 'Paper', choices: ['A4', 'Letter'] }).default('A4').schema,
});
