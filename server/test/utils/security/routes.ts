/**
 * Every HTTP route of the app, read from the controllers' own decorators, with the access rule each one declares.
 * The walk is static (from AppModule's imports) so jest can name one test per route; `controllersInApp` lists what
 * Nest actually registered, so a test can prove the static walk missed nothing.
 */
import type { INestApplication, Type } from '@nestjs/common';
import { ParseUUIDPipe, RequestMethod } from '@nestjs/common';
import { METHOD_METADATA, MODULE_METADATA, PATH_METADATA, ROUTE_ARGS_METADATA } from '@nestjs/common/constants';
import { RouteParamtypes } from '@nestjs/common/enums/route-paramtypes.enum';
import { ModulesContainer } from '@nestjs/core';
import type { Role } from '@keenroute/shared';
import { AppModule } from '../../../src/app.module';
import { IS_PUBLIC_KEY } from '../../../src/auth/decorators/public.decorator';
import { ROLES_KEY } from '../../../src/auth/decorators/roles.decorator';

export const GLOBAL_PREFIX = 'api';

export type AccessRule = { kind: 'public' } | { kind: 'roles'; roles: readonly Role[] } | { kind: 'undeclared' };

export type HttpVerb = 'get' | 'post' | 'put' | 'patch' | 'delete';

export interface RouteInfo {
  verb: HttpVerb;
  /** Express-style path with the global prefix, e.g. /api/stops/:id */
  path: string;
  controller: Type;
  handler: string;
  rule: AccessRule;
  /** The class of the @Body() argument, when it is a class (a DTO). */
  bodyDto?: Type;
  /** The class of the @Query() argument, when it is a class (a DTO). */
  queryDto?: Type;
  /** Path parameters read through ParseUUIDPipe: anything but a UUID is refused before the handler. */
  uuidParams: string[];
}

const VERBS: Partial<Record<RequestMethod, HttpVerb>> = {
  [RequestMethod.GET]: 'get',
  [RequestMethod.POST]: 'post',
  [RequestMethod.PUT]: 'put',
  [RequestMethod.PATCH]: 'patch',
  [RequestMethod.DELETE]: 'delete',
};

type ModuleRef = Type | { module: Type; imports?: unknown[]; controllers?: Type[] } | { forwardRef: () => unknown };

/** The controllers of every module reachable from AppModule's imports, as Nest's scanner would find them. */
export function controllersOf(root: Type = AppModule): Type[] {
  const seen = new Set<unknown>();
  const found = new Set<Type>();
  const visit = (ref: ModuleRef | undefined): void => {
    if (!ref) return;
    if (typeof ref === 'object' && 'forwardRef' in ref) return visit(ref.forwardRef() as ModuleRef);
    const moduleClass = typeof ref === 'function' ? ref : ref.module;
    const key = typeof ref === 'function' ? ref : ref;
    if (seen.has(key)) return;
    seen.add(key);
    const own = (Reflect.getMetadata(MODULE_METADATA.CONTROLLERS, moduleClass) ?? []) as Type[];
    const dynamic = typeof ref === 'function' ? [] : (ref.controllers ?? []);
    for (const controller of [...own, ...dynamic]) found.add(controller);
    const imports = [
      ...((Reflect.getMetadata(MODULE_METADATA.IMPORTS, moduleClass) ?? []) as ModuleRef[]),
      ...(typeof ref === 'function' ? [] : ((ref.imports ?? []) as ModuleRef[])),
    ];
    for (const imported of imports) {
      // A Promise is an async dynamic module: none of Keenroute's carry controllers.
      if (imported && !(imported instanceof Promise)) visit(imported);
    }
  };
  visit(root);
  return [...found];
}

/** The controllers Nest registered in a running app. */
export function controllersInApp(app: INestApplication): Type[] {
  const found = new Set<Type>();
  for (const module of app.get(ModulesContainer).values()) {
    for (const wrapper of module.controllers.values()) found.add(wrapper.metatype as Type);
  }
  return [...found];
}

function joinPath(...parts: (string | undefined)[]): string {
  const joined = parts
    .filter((part): part is string => part !== undefined)
    .map((part) => part.replace(/^\/+|\/+$/g, ''))
    .filter((part) => part.length > 0)
    .join('/');
  return `/${joined}`;
}

function ruleFor(controller: Type, handler: object): AccessRule {
  // Same precedence as AccessGuard's getAllAndOverride: the method's own decorator wins over the class's.
  const isPublic = (Reflect.getMetadata(IS_PUBLIC_KEY, handler) ?? Reflect.getMetadata(IS_PUBLIC_KEY, controller)) as
    boolean | undefined;
  if (isPublic) return { kind: 'public' };
  const roles = (Reflect.getMetadata(ROLES_KEY, handler) ?? Reflect.getMetadata(ROLES_KEY, controller)) as
    Role[] | undefined;
  return roles?.length ? { kind: 'roles', roles } : { kind: 'undeclared' };
}

interface RouteArgument {
  index: number;
  data?: unknown;
  pipes?: unknown[];
}

function uuidParams(controller: Type, handler: string): string[] {
  const args = (Reflect.getMetadata(ROUTE_ARGS_METADATA, controller, handler) ?? {}) as Record<string, RouteArgument>;
  return Object.entries(args)
    .filter(([key, arg]) => key.split(':')[0] === String(RouteParamtypes.PARAM) && typeof arg.data === 'string')
    .filter(([, arg]) => (arg.pipes ?? []).some((pipe) => pipe === ParseUUIDPipe || pipe instanceof ParseUUIDPipe))
    .map(([, arg]) => arg.data as string);
}

function argumentDto(controller: Type, handler: string, type: RouteParamtypes): Type | undefined {
  const args = (Reflect.getMetadata(ROUTE_ARGS_METADATA, controller, handler) ?? {}) as Record<string, RouteArgument>;
  const paramTypes = (Reflect.getMetadata('design:paramtypes', controller.prototype, handler) ?? []) as unknown[];
  for (const [key, arg] of Object.entries(args)) {
    if (key.split(':')[0] !== String(type)) continue;
    const candidate = paramTypes[arg.index];
    if (typeof candidate === 'function' && candidate !== Object && candidate !== String) return candidate as Type;
  }
  return undefined;
}

export function routesOf(controllers: readonly Type[]): RouteInfo[] {
  const routes: RouteInfo[] = [];
  for (const controller of controllers) {
    const bases = [Reflect.getMetadata(PATH_METADATA, controller) as string | string[] | undefined].flat();
    for (const handler of Object.getOwnPropertyNames(controller.prototype)) {
      if (handler === 'constructor') continue;
      const fn = (controller.prototype as Record<string, unknown>)[handler];
      if (typeof fn !== 'function') continue;
      const method = Reflect.getMetadata(METHOD_METADATA, fn) as RequestMethod | undefined;
      const paths = Reflect.getMetadata(PATH_METADATA, fn) as string | string[] | undefined;
      if (method === undefined || paths === undefined) continue;
      const verb = VERBS[method];
      if (!verb) throw new Error(`${controller.name}.${handler} uses an HTTP method the matrix does not know.`);
      for (const base of bases) {
        for (const path of [paths].flat()) {
          routes.push({
            verb,
            path: joinPath(GLOBAL_PREFIX, base, path),
            controller,
            handler,
            rule: ruleFor(controller, fn),
            bodyDto: argumentDto(controller, handler, RouteParamtypes.BODY),
            queryDto: argumentDto(controller, handler, RouteParamtypes.QUERY),
            uuidParams: uuidParams(controller, handler),
          });
        }
      }
    }
  }
  return routes.sort((a, b) => a.path.localeCompare(b.path) || a.verb.localeCompare(b.verb));
}

export const allRoutes = (): RouteInfo[] => routesOf(controllersOf());

export const routeName = (route: Pick<RouteInfo, 'verb' | 'path'>) => `${route.verb.toUpperCase()} ${route.path}`;

export const MADE_UP_ID = '00000000-0000-4000-8000-000000000000';

/** The names of a path's :params, in order. */
export const pathParams = (path: string) => [...path.matchAll(/:([A-Za-z]\w*)/g)].map((match) => match[1]!);

/** The path with each :param replaced by `values[name]`, or by a well-formed id that names nothing. */
export function madeUpPath(path: string, values: Record<string, string> = {}): string {
  return path.replace(/:([A-Za-z]\w*)/g, (_match, name: string) => values[name] ?? MADE_UP_ID);
}
