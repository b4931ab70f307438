import { type ArgumentMetadata, BadRequestException, Injectable, type PipeTransform } from '@nestjs/common';

/**
 * Refuses the NUL character (U+0000) in any string of a body, query or path, naming the field. PostgreSQL cannot
 * keep it in text (the write would fail as a server error), SQLite would keep it only to cut it off in other
 * programs, and nothing anyone types needs it. A push's mutations are not seen here (pushed-mutations.ts): the
 * engine refuses one carrying it alone, through core's fieldError.
 */
@Injectable()
export class RefuseNulPipe implements PipeTransform {
  transform(value: unknown, metadata: ArgumentMetadata): unknown {
    if (metadata.type === 'custom') return value;
    const at = nulAt(value, metadata.type === 'param' ? (metadata.data ?? '') : '');
    if (at !== null) throw new BadRequestException([`${at || 'the request'} must not contain the NUL character (U+0000)`]);
    return value;
  }
}

/** Where the first NUL is, as a field path, or null. */
function nulAt(value: unknown, path: string): string | null {
  if (typeof value === 'string') return value.includes('\u0000') ? path : null;
  if (typeof value !== 'object' || value === null) return null;
  for (const [key, item] of Object.entries(value)) {
    const here = Array.isArray(value) ? `${path}[${key}]` : path ? `${path}.${key}` : key;
    if (key.includes('\u0000')) return here;
    const found = nulAt(item, here);
    if (found !== null) return found;
  }
  return null;
}
