import { RequestMethod } from '@nestjs/common';
import { RouteParamtypes } from '@nestjs/common/enums/route-paramtypes.enum.js';
import { METHOD_METADATA, PATH_METADATA, ROUTE_ARGS_METADATA } from '@nestjs/common/constants.js';
import { ModulesContainer, Reflector } from '@nestjs/core';
import { IS_PUBLIC_KEY } from '../src/common/decorators/public.decorator.js';
import { ROLES_KEY } from '../src/common/decorators/roles.decorator.js';
import type { TestApp } from './test-app.js';

type Dto = new (...args: never[]) => unknown;

export interface Route {
  method: 'get' | 'post' | 'patch' | 'put' | 'delete';
  path: string;
  roles: string[] | null;
  isPublic: boolean;
  /** The DTO classes the handler validates, read from its parameters. */
  body: Dto | null;
  query: Dto | null;
  /** Path parameters, in the order they appear. */
  params: string[];
}

const VERBS: Partial<Record<RequestMethod, Route['method']>> = {
  [RequestMethod.GET]: 'get',
  [RequestMethod.POST]: 'post',
  [RequestMethod.PATCH]: 'patch',
  [RequestMethod.PUT]: 'put',
  [RequestMethod.DELETE]: 'delete',
};

/** The DTO behind the handler's @Body() or @Query(), when it takes the whole of it as a class. */
function dtoOf(ctrl: Dto, name: string, kind: RouteParamtypes): Dto | null {
  const args = (Reflect.getMetadata(ROUTE_ARGS_METADATA, ctrl, name) ?? {}) as Record<string, { index: number; data?: unknown }>;
  const types = (Reflect.getMetadata('design:paramtypes', ctrl.prototype as object, name) ?? []) as unknown[];
  for (const [key, arg] of Object.entries(args)) {
    if (key.split(':')[0] !== String(kind) || arg.data !== undefined) continue;
    const type = types[arg.index];
    if (typeof type === 'function' && type !== Object) return type as Dto;
  }
  return null;
}

/** Every route the running app serves, read from its controllers, so that a new route cannot be left out of a suite. */
export function routesOf(t: TestApp): Route[] {
  const reflector = t.app.get(Reflector);
  const routes: Route[] = [];
  for (const module of t.app.get(ModulesContainer).values()) {
    for (const wrapper of module.controllers.values()) {
      const ctrl = wrapper.metatype as Dto | null;
      if (!ctrl) continue;
      const base = String(Reflect.getMetadata(PATH_METADATA, ctrl) ?? '');
      for (const name of Object.getOwnPropertyNames(ctrl.prototype)) {
        const handler = (ctrl.prototype as Record<string, unknown>)[name];
        if (typeof handler !== 'function' || name === 'constructor') continue;
        const verb = Reflect.getMetadata(METHOD_METADATA, handler) as RequestMethod | undefined;
        if (verb === undefined || !VERBS[verb]) continue;
        const sub = String(Reflect.getMetadata(PATH_METADATA, handler) ?? '');
        const path = `/api/${[base, sub].filter((p) => p && p !== '/').join('/')}`.replace(/\/+/g, '/');
        routes.push({
          method: VERBS[verb]!,
          path,
          roles: reflector.getAllAndOverride<string[] | undefined>(ROLES_KEY, [handler as () => void, ctrl]) ?? null,
          isPublic: !!reflector.getAllAndOverride<boolean>(IS_PUBLIC_KEY, [handler as () => void, ctrl]),
          body: dtoOf(ctrl, name, RouteParamtypes.BODY),
          query: dtoOf(ctrl, name, RouteParamtypes.QUERY),
          params: [...path.matchAll(/:([A-Za-z]+)/g)].map((m) => m[1]!),
        });
      }
    }
  }
  return routes;
}

/** The path with each parameter replaced, in order, by the values given (or the one value for all). */
export function fillPath(path: string, values: string | string[]): string {
  let i = 0;
  return path.replace(/:[A-Za-z]+/g, () => (typeof values === 'string' ? values : values[i++]!));
}
