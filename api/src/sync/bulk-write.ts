import type { EntityManager, EntityTarget, ObjectLiteral } from 'typeorm';

/** The bound values of one statement and their marks: `?` for SQLite, `$1`, `$2`, … for PostgreSQL. */
function parameters(em: EntityManager): { values: unknown[]; mark: (value: unknown) => string } {
  const numbered = em.connection.driver.options.type === 'postgres';
  const values: unknown[] = [];
  return {
    values,
    mark: (value) => {
      values.push(value);
      return numbered ? `$${values.length}` : '?';
    },
  };
}

/**
 * Many rows in one statement, with the values converted by the database driver exactly as TypeORM would convert
 * them (JSON, dates, booleans), but without TypeORM's per-parameter query building, which costs more than the
 * write itself for a batch of a hundred rows. Works on SQLite and PostgreSQL alike.
 */
export async function insertMany<T extends ObjectLiteral>(
  em: EntityManager,
  target: EntityTarget<T>,
  rows: Record<string, unknown>[],
  onConflict?: { columns: string[] },
): Promise<void> {
  if (!rows.length) return;
  const meta = em.connection.getMetadata(target);
  const driver = em.connection.driver;
  // A column no row gives a value for is left to its default; the others are written for every row.
  const columns = meta.columns.filter((c) => c.isInsert && rows.some((r) => c.getEntityValue(r) !== undefined));
  const params = parameters(em);
  // Rows made together share their times: each column converts a Date once, not once per row.
  const lastDate: unknown[] = [];
  const lastConverted: unknown[] = [];
  const tuples = rows.map((row) => {
    const marks = columns.map((c, i) => {
      let value = c.getEntityValue(row);
      if (value === undefined) value = c.isCreateDate || c.isUpdateDate ? new Date() : null;
      if (!(value instanceof Date)) return params.mark(driver.preparePersistentValue(value, c));
      if (value !== lastDate[i]) {
        lastDate[i] = value;
        lastConverted[i] = driver.preparePersistentValue(value, c);
      }
      return params.mark(lastConverted[i]);
    });
    return `(${marks.join(', ')})`;
  });
  const names = columns.map((c) => driver.escape(c.databaseName));
  let sql = `INSERT INTO ${driver.escape(meta.tableName)} (${names.join(', ')}) VALUES ${tuples.join(', ')}`;
  if (onConflict) {
    const keys = new Set(onConflict.columns);
    const updates = columns.filter((c) => !keys.has(c.propertyName)).map((c) => `${driver.escape(c.databaseName)} = excluded.${driver.escape(c.databaseName)}`);
    sql += ` ON CONFLICT (${onConflict.columns.map((k) => driver.escape(meta.findColumnWithPropertyName(k)!.databaseName)).join(', ')}) DO UPDATE SET ${updates.join(', ')}`;
  }
  await em.query(sql, params.values);
}

/** Values per `IN (…)` list: well inside SQLite's 32,766 and PostgreSQL's 65,535 bound parameters. */
const IN_LIST_LIMIT = 1000;

/**
 * Rows whose `column` is one of `values`, read with plain statements (one per thousand values) and hydrated by the
 * driver as TypeORM would (JSON parsed, dates made Dates): the batch's look-ups and a pull's rows, without the query
 * builder's cost.
 */
export async function selectMany<T extends ObjectLiteral>(
  em: EntityManager,
  target: EntityTarget<T>,
  column: string,
  values: readonly unknown[],
  where: Record<string, unknown> = {},
): Promise<T[]> {
  if (!values.length) return [];
  const meta = em.connection.getMetadata(target);
  const driver = em.connection.driver;
  const col = (name: string) => driver.escape(meta.findColumnWithPropertyName(name)!.databaseName);
  const columns = meta.columns.map((c) => ({ c, property: c.propertyName, name: c.databaseName }));
  const out: T[] = [];
  for (let start = 0; start < values.length; start += IN_LIST_LIMIT) {
    const { values: params, mark } = parameters(em);
    const conditions = [`${col(column)} IN (${values.slice(start, start + IN_LIST_LIMIT).map(mark).join(', ')})`];
    for (const [name, value] of Object.entries(where)) conditions.push(value === null ? `${col(name)} IS NULL` : `${col(name)} = ${mark(value)}`);
    const raw = await em.query<Record<string, unknown>[]>(`SELECT * FROM ${driver.escape(meta.tableName)} WHERE ${conditions.join(' AND ')}`, params);
    for (const r of raw) {
      const row: Record<string, unknown> = {};
      for (const { c, property, name } of columns) row[property] = driver.prepareHydratedValue(r[name], c);
      // Every column of T's metadata, hydrated by the driver: what TypeORM's own find gives typed as T.
      out.push(row as T);
    }
  }
  return out;
}

/**
 * `UPDATE … SET … WHERE key = value` with the values converted by the driver, and the update-date column set to
 * CURRENT_TIMESTAMP as TypeORM's update() does; one cached statement per set of columns.
 */
export async function updateWhere<T extends ObjectLiteral>(
  em: EntityManager,
  target: EntityTarget<T>,
  key: Record<string, unknown>,
  changes: Record<string, unknown>,
): Promise<void> {
  const meta = em.connection.getMetadata(target);
  const driver = em.connection.driver;
  const { values: params, mark } = parameters(em);
  const column = (name: string) => meta.findColumnWithPropertyName(name)!;
  // As TypeORM's update(), a property left undefined is not written.
  const sets = Object.entries(changes).filter(([, value]) => value !== undefined).map(([name, value]) => {
    const c = column(name);
    return `${driver.escape(c.databaseName)} = ${mark(driver.preparePersistentValue(value, c))}`;
  });
  const updateDate = meta.updateDateColumn;
  if (updateDate && changes[updateDate.propertyName] === undefined) sets.push(`${driver.escape(updateDate.databaseName)} = CURRENT_TIMESTAMP`);
  const conditions = Object.entries(key).map(([name, value]) => `${driver.escape(column(name).databaseName)} = ${mark(driver.preparePersistentValue(value, column(name)))}`);
  await em.query(`UPDATE ${driver.escape(meta.tableName)} SET ${sets.join(', ')} WHERE ${conditions.join(' AND ')}`, params);
}
