import type { Request } from 'express';

/** A host as a Host header may name one: a name or an IPv4 address, or an IPv6 one in brackets, and a port. */
const HOST = /^(?:[A-Za-z0-9](?:[A-Za-z0-9-]{0,61}[A-Za-z0-9])?(?:\.[A-Za-z0-9](?:[A-Za-z0-9-]{0,61}[A-Za-z0-9])?)*|\[[0-9A-Fa-f:.]+\])(?::\d{1,5})?$/;

/**
 * The address a request came to, as the person who sent it reached us: Express reads the scheme and host from
 * X-Forwarded-Proto and X-Forwarded-Host only when TRUST_PROXY trusts the proxy that sent them, and from the
 * connection and the Host header otherwise. Null when the host is not one a browser could have used.
 */
export function requestOrigin(req: Request): string | null {
  const host = req.host;
  if (!host || !HOST.test(host)) return null;
  const scheme = req.protocol === 'https' ? 'https' : 'http';
  return `${scheme}://${host}`;
}
