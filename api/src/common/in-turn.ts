/**
 * Promise.all for the queries of one transaction, started one after another: a transaction is one connection,
 * and PostgreSQL's driver takes a connection's queries one at a time (pg 9 refuses overlapping ones).
 */
export async function inTurn<T extends readonly (() => unknown)[]>(...tasks: T): Promise<{ -readonly [K in keyof T]: Awaited<ReturnType<T[K]>> }> {
  const results: unknown[] = [];
  for (const task of tasks) results.push(await task());
  // A loop cannot build a mapped tuple type; each result is the awaited value of the task in its place.
  return results as { -readonly [K in keyof T]: Awaited<ReturnType<T[K]>> };
}
