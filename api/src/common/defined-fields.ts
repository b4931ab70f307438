/** The fields a PATCH body actually sent, so that absent ones never overwrite stored values. */
export function definedFields<T extends object>(dto: T): Partial<T> {
  return Object.fromEntries(Object.entries(dto).filter(([, v]) => v !== undefined)) as Partial<T>;
}
