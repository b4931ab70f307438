import { databaseType } from '../config/database.config.js';

/** The few conditions SQLite and PostgreSQL spell differently, for SQL written beside the query builder. */

/** A column holding a JSON list (simple-json text) has the parameter's value among its items. */
export function jsonListHas(column: string, param: string): string {
  return databaseType() === 'postgres'
    ? `CAST(${column} AS jsonb) @> jsonb_build_array(CAST(:${param} AS text))`
    : `EXISTS (SELECT 1 FROM json_each(${column}) AS item WHERE item.value = :${param})`;
}

/** Text that contains the parameter (a LIKE pattern escaped with backslashes), ignoring case as SQLite's LIKE does. */
export function textLike(column: string, param: string): string {
  return `LOWER(${column}) LIKE LOWER(:${param}) ESCAPE '\\'`;
}
