import { BadRequestException } from '@nestjs/common';

/** The fields a PATCH body actually sent, so that absent ones never overwrite stored values. */
export function definedFields<T extends object>(dto: T): Partial<T> {
  const sent: Partial<T> = { ...dto };
  for (const [field, value] of Object.entries(sent)) if (value === undefined) Reflect.deleteProperty(sent, field);
  return sent;
}

/** The same, for a body whose fields are checked field by field downstream (by the field registry). */
export function sentFields(dto: object): Record<string, unknown> {
  return Object.fromEntries(Object.entries(dto).filter(([, v]) => v !== undefined));
}

/**
 * Refuses a PATCH that sends null for a field that cannot be emptied: class-validator's IsOptional lets null through,
 * and the database would then refuse the row with a 500.
 */
export function refuseEmptied<T extends object>(changes: Partial<T>, fields: ReadonlyArray<keyof T & string>): void {
  const emptied = fields.filter((f) => changes[f] === null).map((f) => `${f} cannot be emptied`);
  if (emptied.length) throw new BadRequestException(emptied);
}
