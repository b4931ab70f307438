import { createSecretKey, type KeyObject } from 'node:crypto';

const keys = new Map<string, KeyObject>();

/**
 * The access tokens' HS256 key, made once per secret. Given the secret as text, jsonwebtoken first tries to read it
 * as a public key on every verification, and fails, which costs about half a millisecond a request.
 */
export function signingKey(secret: string): KeyObject {
  let key = keys.get(secret);
  if (!key) keys.set(secret, (key = createSecretKey(Buffer.from(secret))));
  return key;
}
