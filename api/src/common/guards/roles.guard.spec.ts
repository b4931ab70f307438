import { describe, expect, it } from '@jest/globals';
import { ForbiddenException, type ExecutionContext } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import { IS_PUBLIC_KEY } from '../decorators/public.decorator.js';
import { ROLES_KEY } from '../decorators/roles.decorator.js';
import { RolesGuard } from './roles.guard.js';

function contextFor(meta: Record<string, unknown>, role?: string): { guard: RolesGuard; ctx: ExecutionContext } {
  const handler = () => undefined;
  for (const [k, v] of Object.entries(meta)) Reflect.defineMetadata(k, v, handler);
  const ctx = {
    getHandler: () => handler,
    getClass: () => class {},
    switchToHttp: () => ({ getRequest: () => ({ user: role ? { role } : undefined }) }),
  } as unknown as ExecutionContext;
  return { guard: new RolesGuard(new Reflector()), ctx };
}

describe('RolesGuard', () => {
  it('lets a listed role through', () => {
    const { guard, ctx } = contextFor({ [ROLES_KEY]: ['admin', 'office'] }, 'office');
    expect(guard.canActivate(ctx)).toBe(true);
  });

  it('refuses a role that is not listed', () => {
    const { guard, ctx } = contextFor({ [ROLES_KEY]: ['admin'] }, 'technician');
    expect(() => guard.canActivate(ctx)).toThrow(ForbiddenException);
  });

  it('refuses everyone on a route that names no roles', () => {
    const { guard, ctx } = contextFor({}, 'admin');
    expect(() => guard.canActivate(ctx)).toThrow(ForbiddenException);
  });

  it('lets anyone through a public route', () => {
    const { guard, ctx } = contextFor({ [IS_PUBLIC_KEY]: true });
    expect(guard.canActivate(ctx)).toBe(true);
  });
});
