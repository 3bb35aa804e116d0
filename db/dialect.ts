import type { Knex } from 'knex';

/** The few SQL spellings that differ between SQLite and PostgreSQL; everything else is plain knex. */
function isPostgres(knex: Knex | Knex.Transaction): boolean {
  return (knex.client as { dialect?: string }).dialect === 'postgresql';
}

/** Case-insensitive LIKE (SQLite's LIKE already ignores ASCII case; PostgreSQL's does not). */
export function likeOperator(knex: Knex | Knex.Transaction): 'LIKE' | 'ILIKE' {
  return isPostgres(knex) ? 'ILIKE' : 'LIKE';
}

/** An ORDER BY expression that sorts text without regard to case on both engines. */
export function caseInsensitiveOrder(knex: Knex | Knex.Transaction, column: string): string {
  return isPostgres(knex) ? `lower(${column})` : `${column} COLLATE NOCASE`;
}
