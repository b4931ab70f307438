import { useEffect, useState } from 'react';

/**
 * An object URL for bytes held in memory, made once per `key` and revoked when the key changes or the screen
 * goes away (a list of hundreds of photos must not leak them).
 */
export function useObjectUrl(key: string | null, data: Blob | ArrayBuffer | null | undefined, type = 'image/jpeg'): string | null {
  const [url, setUrl] = useState<string | null>(null);
  const ready = key !== null && !!data;
  useEffect(() => {
    if (!ready || !data) {
      setUrl(null);
      return;
    }
    const made = URL.createObjectURL(data instanceof Blob ? data : new Blob([data], { type }));
    setUrl(made);
    return () => URL.revokeObjectURL(made);
    // The bytes behind a key never change; a new copy of the same bytes must not make a new URL.
  }, [key, ready]);
  return url;
}
