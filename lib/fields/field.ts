import { z } from 'zod';

/**
 * A field, declared once: what it is called, its unit and range, how it is
 * stored, listed and exchanged, and the zod schema built from those same facts.
 * Entity modules declare a table of fields with `defineFields`; schemas, row
 * mappings, CSV columns, list columns, form labels and messages read the table.
 */

export type FieldKind = 'number' | 'length' | 'text' | 'choice' | 'flag' | 'list';

/** How a list of records shows the field: as a column (headed `header`, else the label), sortable, matched by the search box. */
export type ListBehaviour = { readonly column?: boolean; readonly sort?: boolean; readonly search?: boolean; readonly header?: string };

export type FieldInfo = {
  /** The JSON / form key; set by `defineFields` from the table's key. */
  readonly key: string;
  readonly label: string;
  readonly kind: FieldKind;
  /** The unit values are held in ('mm', '°', '° BTDC'), '' for none. A length is always held in mm. */
  readonly unit: string;
  readonly min?: number | undefined;
  readonly max?: number | undefined;
  /** False when the value may be left out, left blank or has a default. */
  readonly required: boolean;
  readonly minLength?: number | undefined;
  readonly maxLength?: number | undefined;
  readonly choices?: readonly string[] | undefined;
  /** Column name in CSV import and export; no CSV column when absent. */
  readonly csvColumn?: string | undefined;
  /** SQL column, when the entity is stored in a table. */
  readonly column?: string | undefined;
  readonly list: ListBehaviour;
  /** One line a form shows under the field. */
  readonly help?: string | undefined;
  /** Advice appended to a range message (what to do about a value out of range). */
  readonly hint?: string | undefined;
};

/** What a builder may say about a field beyond its kind and range. */
export type FieldOptions = Partial<Pick<FieldInfo, 'csvColumn' | 'column' | 'list' | 'help' | 'hint'>> & { label: string };

export class Field<S extends z.ZodType = z.ZodType> implements FieldInfo {
  declare readonly key: string;
  declare readonly label: string;
  declare readonly kind: FieldKind;
  declare readonly unit: string;
  declare readonly min?: number;
  declare readonly max?: number;
  declare readonly required: boolean;
  declare readonly minLength?: number;
  declare readonly maxLength?: number;
  declare readonly choices?: readonly string[];
  declare readonly csvColumn?: string;
  declare readonly column?: string;
  declare readonly list: ListBehaviour;
  declare readonly help?: string;
  declare readonly hint?: string;
  readonly schema: S;

  constructor(info: Omit<FieldInfo, 'key' | 'list'> & { key?: string; list?: ListBehaviour }, schema: S) {
    Object.assign(this, { key: '', list: {} }, info);
    this.schema = schema;
  }

  get info(): FieldInfo {
    const { schema: _schema, ...info } = this as Field<S>;
    return info;
  }

  /** The same field with another schema (a refinement, a default) and, optionally, changed facts. */
  withSchema<T extends z.ZodType>(schema: T, info: Partial<FieldInfo> = {}): Field<T> {
    return new Field({ ...this.info, ...info }, schema);
  }

  /** May be left out (`undefined`). */
  optional(): Field<z.ZodOptional<S>> {
    return this.withSchema(z.optional(this.schema), { required: false });
  }

  /** `null` means "not known". */
  nullable(): Field<z.ZodNullable<S>> {
    return this.withSchema(z.nullable(this.schema), { required: false });
  }

  /** Takes `value` when left out. */
  default(value: z.util.NoUndefined<z.output<S>>): Field<z.ZodDefault<S>> {
    return this.withSchema(z._default(this.schema, value), { required: false });
  }
}

export type Keyed<T extends Record<string, Field>> = { readonly [K in keyof T & string]: T[K] & { readonly key: K } };

/** A table of fields keyed by their JSON key, in the order forms and CSV files list them. */
export function defineFields<const T extends Record<string, Field>>(table: T): Keyed<T> {
  const keyed: Record<string, Field> = {};
  for (const [key, field] of Object.entries(table)) keyed[key] = field.withSchema(field.schema, { key });
  return keyed as Keyed<T>;
}

/** The zod object shape of a table: `z.object(shapeOf(table))`. */
export function shapeOf<T extends Record<string, Field>>(table: T): { [K in keyof T]: T[K]['schema'] } {
  const shape: Record<string, z.ZodType> = {};
  for (const [key, field] of Object.entries(table)) shape[key] = field.schema;
  return shape as { [K in keyof T]: T[K]['schema'] };
}

/** The fields of a table in declaration order. */
export function fieldsOf<T extends Record<string, Field>>(table: T): Array<T[keyof T]> {
  return Object.values(table) as Array<T[keyof T]>;
}
