import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { ESLint } from 'eslint';
import { beforeAll, describe, expect, it } from 'vitest';

/**
 * The layer rules live in eslint.config.js. Each case lints a small snippet as if it
 * sat at a real path and checks which rule fires, so a rule that stops matching fails here.
 */
const root = join(import.meta.dirname, '..', '..');
let eslint: ESLint;

beforeAll(() => {
  eslint = new ESLint({ cwd: root });
});

async function rulesFired(filePath: string, code: string): Promise<string[]> {
  const [result] = await eslint.lintText(code, { filePath: join(root, filePath) });
  return result.messages.map((message) => message.ruleId ?? `fatal: ${message.message}`);
}

const importing = (specifier: string) => `import * as imported from '${specifier}';\nexport const used = imported;\n`;

describe('the engine (shared/uncertainty) stays portable', () => {
  it.each([
    ['node:fs', 'a Node built-in'],
    ['crypto', 'a Node built-in without the node: prefix'],
    ['react', 'a framework'],
    ['express', 'a server framework'],
    ['knex', 'a database library'],
    ['../contracts/library', 'shared/contracts'],
    ['../../server/lib/errors', 'the server'],
    ['../../src/lib/api-error', 'the client'],
    ['../../bench/load', 'the benchmark'],
  ])('refuses an import of %s (%s)', async (specifier) => {
    expect(await rulesFired('shared/uncertainty/gum-budget.ts', importing(specifier))).toEqual([
      'boundaries/dependencies',
    ]);
  });

  it('refuses a type import, a re-export and a dynamic import alike', async () => {
    const file = 'shared/uncertainty/gum-budget.ts';
    expect(await rulesFired(file, "import type { Request } from 'express';\nexport type Host = Request;\n")).toEqual([
      'boundaries/dependencies',
    ]);
    expect(await rulesFired(file, "export { readFileSync } from 'node:fs';\n")).toEqual(['boundaries/dependencies']);
    expect(await rulesFired(file, "export const load = () => import('node:fs');\n")).toEqual([
      'boundaries/dependencies',
    ]);
  });

  it('allows its own files and zod', async () => {
    expect(await rulesFired('shared/uncertainty/gum-budget.ts', importing('./distributions'))).toEqual([]);
    expect(await rulesFired('shared/uncertainty/gum-budget.ts', importing('zod'))).toEqual([]);
  });

  it.each(['window', 'document', 'localStorage', 'process', 'Buffer'])('refuses the host global %s', async (name) => {
    expect(await rulesFired('shared/uncertainty/gum-budget.ts', `export const host = ${name};\n`)).toEqual([
      'no-restricted-globals',
    ]);
  });

  it('lets its tests read fixtures from disk', async () => {
    expect(await rulesFired('shared/uncertainty/gum-budget.test.ts', importing('node:fs'))).toEqual([]);
  });
});

describe('shared/contracts serves both sides', () => {
  it('refuses the server, the client, Node and frameworks', async () => {
    for (const specifier of ['../../server/lib/errors', '../../src/lib/api-error', 'node:fs', 'react']) {
      expect(await rulesFired('shared/contracts/library.ts', importing(specifier))).toEqual([
        'boundaries/dependencies',
      ]);
    }
  });

  it('allows the engine and zod', async () => {
    expect(await rulesFired('shared/contracts/library.ts', importing('../uncertainty'))).toEqual([]);
    expect(await rulesFired('shared/contracts/library.ts', importing('zod'))).toEqual([]);
  });
});

describe('shared/domain holds the rules over the contracts', () => {
  it('refuses the server, the client, Node and frameworks', async () => {
    for (const specifier of ['../../server/lib/errors', '../../src/lib/api-error', 'node:fs', 'react']) {
      expect(await rulesFired('shared/domain/version-lifecycle.ts', importing(specifier))).toEqual([
        'boundaries/dependencies',
      ]);
    }
  });

  it('allows the contracts and zod, and is not imported by them', async () => {
    expect(await rulesFired('shared/domain/version-lifecycle.ts', importing('../contracts/permissions'))).toEqual([]);
    expect(await rulesFired('shared/domain/version-lifecycle.ts', importing('zod'))).toEqual([]);
    expect(await rulesFired('shared/contracts/library.ts', importing('../domain/version-lifecycle'))).toEqual([
      'boundaries/dependencies',
    ]);
  });

  it('stays out of the engine', async () => {
    expect(await rulesFired('shared/uncertainty/gum-budget.ts', importing('../domain/version-lifecycle'))).toEqual([
      'boundaries/dependencies',
    ]);
  });
});

describe('src and server never import each other', () => {
  it('refuses the server in the client', async () => {
    expect(await rulesFired('src/lib/api-client.ts', importing('../../server/lib/errors'))).toEqual([
      'boundaries/dependencies',
    ]);
    expect(
      await rulesFired('src/features/library/api/get-equipment-list.ts', importing('../../../../server/app')),
    ).toEqual(['boundaries/dependencies']);
  });

  it('refuses the client in the server', async () => {
    expect(await rulesFired('server/app.ts', importing('../src/lib/api-client'))).toEqual(['boundaries/dependencies']);
  });

  it('lets both import shared code', async () => {
    expect(await rulesFired('server/app.ts', importing('../shared/contracts/library'))).toEqual([]);
    expect(await rulesFired('src/lib/api-client.ts', importing('../../shared/contracts/errors'))).toEqual([]);
  });
});

describe('client layers (app → features → components, lib, config)', () => {
  it('refuses one feature importing another', async () => {
    expect(
      await rulesFired('src/features/library/components/library-page.tsx', importing('../../auth/api/get-me')),
    ).toEqual(['boundaries/dependencies']);
  });

  it('allows a feature its own files, components and lib', async () => {
    const file = 'src/features/library/components/library-page.tsx';
    expect(await rulesFired(file, importing('../api/get-equipment-list'))).toEqual([]);
    expect(await rulesFired(file, importing('../../../components/ui/button'))).toEqual([]);
    expect(await rulesFired(file, importing('../../../lib/api-client'))).toEqual([]);
  });

  it('refuses features and the app layer below the features', async () => {
    expect(await rulesFired('src/lib/query-client.ts', importing('../features/auth/api/get-me'))).toEqual([
      'boundaries/dependencies',
    ]);
    expect(await rulesFired('src/components/ui/button.tsx', importing('../../app/router'))).toEqual([
      'boundaries/dependencies',
    ]);
    expect(await rulesFired('src/features/auth/api/get-me.ts', importing('../../../app/router'))).toEqual([
      'boundaries/dependencies',
    ]);
  });

  it('lets the app layer import features', async () => {
    expect(await rulesFired('src/app/router.tsx', importing('../features/auth/api/get-me'))).toEqual([]);
  });
});

describe('server layers (routers → services → repositories → Knex)', () => {
  const router = 'server/policy/policy-router.ts';
  const service = 'server/policy/policy-service.ts';

  it('lints real files: the rules select routers and services by these names', () => {
    expect(existsSync(join(root, router))).toBe(true);
    expect(existsSync(join(root, service))).toBe(true);
  });

  it('refuses Knex, the connection and repositories in a router', async () => {
    for (const specifier of ['knex', '../db/connection', './policy-repository']) {
      expect(await rulesFired(router, importing(specifier))).toEqual(['no-restricted-imports']);
    }
    expect(await rulesFired(router, importing('./policy-service'))).toEqual([]);
  });

  it('refuses an inline list of roles in a router', async () => {
    const code = (argument: string) => `export const guard = (deps) => deps.authorize.lab(${argument});\n`;
    expect(await rulesFired(router, code("['admin']"))).toEqual(['no-restricted-syntax']);
    expect(await rulesFired(router, code("'keepLibrary'"))).toEqual([]);
  });

  it('refuses SQL and a Knex value import in a service, but not a Knex type', async () => {
    expect(await rulesFired(service, "export const rows = (db) => db('labs').select();\n")).toEqual([
      'no-restricted-syntax',
    ]);
    expect(await rulesFired(service, 'export const sql = (q) => q.raw(1);\n')).toEqual(['no-restricted-syntax']);
    expect(await rulesFired(service, importing('knex'))).toEqual(['@typescript-eslint/no-restricted-imports']);
    expect(await rulesFired(service, "import type { Knex } from 'knex';\nexport type Handle = Knex;\n")).toEqual([]);
  });

  it('refuses the system time outside the clock, and any Date in a service', async () => {
    expect(await rulesFired('server/lib/background.ts', 'export const at = new Date();\n')).toEqual([
      'no-restricted-syntax',
    ]);
    expect(await rulesFired('server/lib/clock.ts', 'export const at = new Date();\n')).toEqual([]);
    expect(await rulesFired(service, 'export const at = (text: string) => new Date(text);\n')).toEqual([
      'no-restricted-syntax',
    ]);
    expect(
      await rulesFired('server/lib/background.ts', 'export const at = (text: string) => new Date(text);\n'),
    ).toEqual([]);
  });
});
