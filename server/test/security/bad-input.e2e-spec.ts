import type { INestApplication, Type } from '@nestjs/common';
import { ROLES, type Role } from '@keenroute/shared';
import request from 'supertest';
import type { App } from 'supertest/types';
import { DataSource } from 'typeorm';
import { createUser, signIn } from '../utils/test-app';
import { bodyWith, dtoFields, isFreeText, type DtoField } from '../utils/security/dto-fields';
import { allRoutes, madeUpPath, pathParams, routeName, type RouteInfo } from '../utils/security/routes';
import { createUnthrottledApp } from '../utils/security/unthrottled-app';

/**
 * Bad input against every DTO, made from each DTO's own validation metadata: wrong types, missing and extra fields,
 * over-long text and arrays, NUL and lone surrogates, ids and choices that are really SQL, bodies that are not objects,
 * and a body over the size limit. Each must answer 400 naming the field (413 for the big body), never a 5xx, and no
 * table may gain or lose a row. Ids in paths are made up: validation runs before any handler, so nothing is found
 * and nothing is written either way.
 */
const routes = allRoutes().filter((route) => route.rule.kind !== 'undeclared');
const withBody = routes.filter((route) => route.bodyDto);
const withQuery = routes.filter((route) => route.queryDto);
const withParams = routes.filter((route) => route.path.includes(':'));

const LONG = 'x'.repeat(20_000);
const MEGABYTE = 'x'.repeat(1024 * 1024);
const SQL = "1' OR '1'='1'; DROP TABLE stops; --";
const UNDER_LIMITS = 10_000;

type Case = { label: string; send: unknown; field: string };
/** One request and its verdict: undefined when the answer is right, else what is wrong. */
type Check = () => Promise<string | undefined>;

const prefixed = (label: string, found: string | undefined) => (found ? `${label}: ${found}` : undefined);

/** Runs the checks a few at a time (none of them writes, so order does not matter) and lists what went wrong. */
async function runAll(checks: readonly Check[], parallel = 4): Promise<string[]> {
  const found: (string | undefined)[] = new Array<string | undefined>(checks.length);
  let next = 0;
  const worker = async () => {
    while (next < checks.length) {
      const index = next++;
      found[index] = await checks[index]!();
    }
  };
  await Promise.all(Array.from({ length: parallel }, worker));
  return found.filter((one): one is string => one !== undefined);
}

/** The bad values a body field of its kind must refuse, each expected to be reported on that field. */
function bodyCases(field: DtoField): Case[] {
  const at = (label: string, value: unknown): Case => ({ label, send: bodyWith(field.keys, value), field: field.path });
  const wrongType: Partial<Record<DtoField['kind'], unknown>> = {
    string: 12345,
    number: '12; DROP TABLE stops',
    boolean: 'not-a-boolean',
    array: 'not-an-array',
    object: 'not-an-object',
    nested: 'not-an-object',
    'nested-array': 'not-an-array',
  };
  const cases = field.kind in wrongType ? [at('wrong type', wrongType[field.kind])] : [];
  if (field.kind === 'string') {
    // The NUL and the lone surrogate are refused by separate checks (unit-tested apart); one request tries both.
    cases.push(at('20 000 characters', LONG), at('a NUL byte and a lone surrogate', 'ab\u0000cd\ud800'));
    if (!isFreeText(field)) cases.push(at('SQL and script', `${SQL}<script>alert(1)</script>`));
  }
  if (field.kind === 'number') cases.push(at('a number too big for PostgreSQL', 1e308));
  if (field.kind === 'array' || field.kind === 'nested-array') {
    cases.push(
      at(
        `${UNDER_LIMITS} items`,
        Array.from({ length: UNDER_LIMITS }, () => 0),
      ),
    );
  }
  return cases;
}

/** The bad values a query field must refuse: there every value arrives as text. */
function queryCases(field: DtoField): Case[] {
  const at = (label: string, value: unknown): Case => ({ label, send: { [field.path]: value }, field: field.path });
  const cases: Case[] = [at('a NUL byte', 'ab\u0000cd'), at('6 000 characters', 'x'.repeat(6000))];
  if (field.kind === 'number') cases.push(at('wrong type', 'abc'), at('too big', '1e308'));
  if (field.kind === 'boolean') cases.push(at('wrong type', 'maybe'));
  if (field.kind === 'string' && !isFreeText(field)) cases.push(at('SQL', SQL));
  if (field.kind === 'string') cases.push(at('given twice', ['a', 'b']));
  return cases;
}

const topLevel = (dto: Type) => dtoFields(dto).filter((field) => field.keys.length === 1);

describe('bad input (e2e)', () => {
  let app: INestApplication<App>;
  const tokens = {} as Record<Role, string>;
  let rowsBefore: Record<string, number>;

  const asCaller = (route: RouteInfo) => {
    if (route.rule.kind !== 'roles') return {};
    const role = ROLES.find((one) => route.rule.kind === 'roles' && route.rule.roles.includes(one))!;
    return { Authorization: `Bearer ${tokens[role]}` };
  };
  const call = (route: RouteInfo, path = madeUpPath(route.path)) => {
    const agent = request(app.getHttpServer());
    return agent[route.verb](path).set(asCaller(route));
  };
  const send = (route: RouteInfo, body: unknown, path?: string) => call(route, path).send(body as object);
  const ask = (route: RouteInfo, query: Record<string, unknown>) => call(route).query(query);

  /** What is wrong with an answer that should refuse `field`, or undefined when it is right. */
  function problem(response: request.Response, field?: string): string | undefined {
    const body = response.body as { message?: unknown; fields?: Record<string, string[]> };
    const message = typeof body.message === 'string' ? body.message : '';
    if (response.status !== 400) return `answered ${response.status} ${message}`.trim();
    if (typeof body.message !== 'string' || body.message.length === 0) return 'answered 400 without a message';
    if (!field) return undefined;
    const named = Object.keys(body.fields ?? {}).some((key) => key === field || key.startsWith(`${field}.`));
    return named ? undefined : `answered 400 without naming ${field}: ${JSON.stringify(body.fields ?? body.message)}`;
  }

  async function rowCounts(): Promise<Record<string, number>> {
    const db = app.get(DataSource);
    const tables = await db.query<{ name: string }[]>(
      `SELECT quote_ident(table_name) AS name FROM information_schema.tables
       WHERE table_schema = 'public' AND table_type = 'BASE TABLE' ORDER BY 1`,
    );
    const counts: Record<string, number> = {};
    for (const { name } of tables) {
      counts[name] = (await db.query<{ n: number }[]>(`SELECT count(*)::int AS n FROM ${name}`))[0]!.n;
    }
    return counts;
  }

  beforeAll(async () => {
    app = await createUnthrottledApp();
    for (const role of ROLES) tokens[role] = (await signIn(app, (await createUser(app, role)).email)).token;
    rowsBefore = await rowCounts();
  });
  afterAll(async () => {
    await app.close();
  });

  it.each(withBody.map((route) => [`${routeName(route)}: ${route.bodyDto!.name} refuses bad bodies`, route] as const))(
    '%s',
    async (_name, route) => {
      const dto = route.bodyDto!;
      const checks: Check[] = [];
      const refused = (label: string, body: unknown, field?: string) =>
        checks.push(async () => prefixed(label, problem(await send(route, body), field)));
      const refusedRaw = (label: string, json: string) =>
        checks.push(async () => {
          const response = await send(route, json).set('Content-Type', 'application/json');
          return response.status === 400 ? undefined : `${label}: answered ${response.status}`;
        });

      refused('an unknown field', { notAField: 'x' }, 'notAField');
      const required = topLevel(dto).filter((field) => field.required);
      if (required.length > 0) {
        checks.push(async () => {
          const response = await send(route, {});
          const found = required.map((field) => prefixed(`missing ${field.path}`, problem(response, field.path)));
          return found.filter(Boolean).join('; ') || undefined;
        });
      }
      for (const field of dtoFields(dto)) {
        for (const one of bodyCases(field)) refused(`${field.path} as ${one.label}`, one.send, one.field);
      }
      refused('an array body', []);
      refused('an array of objects', [{}]);
      refusedRaw('a __proto__ body', '{"__proto__":{"polluted":"yes"},"constructor":{"prototype":{"polluted":"yes"}}}');
      refusedRaw('broken JSON', '{"name": ');
      checks.push(async () => {
        const big = await send(route, { [topLevel(dto)[0]?.path ?? 'text']: MEGABYTE });
        const ok = big.status === 413 && typeof big.body.message === 'string';
        return ok ? undefined : `a 1 MB body: answered ${big.status}`;
      });

      expect(await runAll(checks)).toEqual([]);
      expect(({} as Record<string, unknown>).polluted).toBeUndefined();
    },
  );

  it.each(
    withQuery.map((route) => [`${routeName(route)}: ${route.queryDto!.name} refuses bad queries`, route] as const),
  )('%s', async (_name, route) => {
    const checks: Check[] = [];
    const refused = (label: string, query: Record<string, unknown>, field?: string) =>
      checks.push(async () => prefixed(label, problem(await ask(route, query), field)));
    refused('an unknown parameter', { notAField: 'x' }, 'notAField');
    for (const field of dtoFields(route.queryDto!)) {
      for (const one of queryCases(field))
        refused(`${field.path} as ${one.label}`, one.send as Record<string, unknown>, one.field);
    }
    expect(await runAll(checks)).toEqual([]);
  });

  const oddParams: [string, string][] = [
    ['a NUL byte', 'ab%00cd'],
    ['an encoded lone surrogate', '%ED%A0%80'],
    ['a right-to-left override and an emoji', '%E2%80%AEfdp.exe%F0%9F%92%88'],
    ['SQL', encodeURIComponent(SQL)],
    ['2 000 characters', 'x'.repeat(2000)],
    ['a path climb', '..%2F..%2Fetc%2Fpasswd'],
  ];
  it.each(withParams.map((route) => [`${routeName(route)}: odd path values answer 4xx`, route] as const))(
    '%s',
    async (_name, route) => {
      const wrong: string[] = [];
      const body = route.bodyDto ? {} : undefined;
      const free = pathParams(route.path).filter((name) => !route.uuidParams.includes(name));
      // A ParseUUIDPipe'd id refuses anything else by construction: one SQL value checks the pipe is there.
      const tries = free.length > 0 ? oddParams : oddParams.filter(([label]) => label === 'SQL');
      const targets = free.length > 0 ? free : route.uuidParams;
      for (const [label, value] of tries) {
        const values = Object.fromEntries(targets.map((name) => [name, value]));
        const response = await send(route, body, madeUpPath(route.path, values));
        const ok = free.length > 0 ? response.status >= 400 && response.status < 500 : response.status === 400;
        if (!ok) wrong.push(`${label}: answered ${response.status}`);
      }
      expect(wrong).toEqual([]);
    },
  );

  it('wrote nothing: every table has as many rows as before', async () => {
    expect(await rowCounts()).toEqual(rowsBefore);
  });
});
