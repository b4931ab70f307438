import { type ArgumentMetadata, BadRequestException, Injectable, type PipeTransform } from '@nestjs/common';

const OWN_CHECKS = Symbol('fields that check their own strings');

/**
 * Marks a body field whose strings its handler judges itself: a sync push's mutations are refused one by one
 * (core's fieldError refuses the NUL character too), so that one bad mutation does not fail the batch.
 */
export function ChecksItsOwnStrings(): PropertyDecorator {
  return (target, key) => {
    const keys: Array<string | symbol> = Reflect.getMetadata(OWN_CHECKS, target.constructor) ?? [];
    Reflect.defineMetadata(OWN_CHECKS, [...keys, key], target.constructor);
  };
}

/**
 * Refuses the NUL character (U+0000) in any string of a body, query or path, naming the field. PostgreSQL cannot
 * keep it in text (the write would fail as a server error), SQLite would keep it only to cut it off in other
 * programs, and nothing anyone types needs it.
 */
@Injectable()
export class RefuseNulPipe implements PipeTransform {
  transform(value: unknown, metadata: ArgumentMetadata): unknown {
    if (metadata.type === 'custom') return value;
    const skip = new Set<string | symbol>(metadata.metatype ? (Reflect.getMetadata(OWN_CHECKS, metadata.metatype) ?? []) : []);
    const at = nulAt(value, metadata.type === 'param' ? (metadata.data ?? '') : '', skip, 0);
    if (at !== null) throw new BadRequestException([`${at || 'the request'} must not contain the NUL character (U+0000)`]);
    return value;
  }
}

/** Where the first NUL is, as a field path, or null. Only the top level of a body may be skipped. */
function nulAt(value: unknown, path: string, skip: Set<string | symbol>, depth: number): string | null {
  if (typeof value === 'string') return value.includes('\u0000') ? path : null;
  if (typeof value !== 'object' || value === null) return null;
  for (const [key, item] of Object.entries(value)) {
    if (depth === 0 && skip.has(key)) continue;
    const here = Array.isArray(value) ? `${path}[${key}]` : path ? `${path}.${key}` : key;
    if (key.includes('\u0000')) return here;
    const found = nulAt(item, here, skip, depth + 1);
    if (found !== null) return found;
  }
  return null;
}
