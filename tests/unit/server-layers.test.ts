import { readdirSync, readFileSync, statSync } from 'node:fs';
import { basename, join, relative } from 'node:path';
import { describe, expect, it } from 'vitest';

/** Server layers (CONVENTIONS.md §8, DEVELOPERS.md): routers → services → repositories → Knex. */
const root = join(import.meta.dirname, '..', '..');
const server = join(root, 'server');

function productionFiles(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const path = join(dir, name);
    if (statSync(path).isDirectory()) return sourceDir(name) ? productionFiles(path) : [];
    return /\.ts$/.test(name) && !/\.test\.ts$/.test(name) ? [path] : [];
  });
}
const sourceDir = (name: string) => name !== 'node_modules' && name !== 'test-support';

const importsOf = (file: string) =>
  [
    ...readFileSync(file, 'utf8').matchAll(
      /(?:import|export)[^'"]*?from\s+['"]([^'"]+)['"]|import\(\s*['"]([^'"]+)['"]\s*\)/g,
    ),
  ].map((m) => m[1] ?? m[2]);

const files = productionFiles(server);
const routers = files.filter((file) => /-router\.ts$/.test(file));
const services = files.filter((file) => /-service\.ts$/.test(file));

/** Knex itself, the database connection, or a repository. */
const dataAccess = (specifier: string) =>
  specifier === 'knex' || /(^|\/)db\/connection$/.test(specifier) || /-repository$/.test(specifier);

describe('server layers', () => {
  it('finds the routers and services it checks', () => {
    expect(routers.map((file) => basename(file))).toEqual(
      expect.arrayContaining(['audit-router.ts', 'delivery-log-router.ts', 'policy-router.ts', 'review-router.ts']),
    );
    expect(services.map((file) => basename(file))).toEqual(
      expect.arrayContaining(['audit-service.ts', 'policy-service.ts', 'review-service.ts', 'delivery-log-service.ts']),
    );
  });

  it('routers reach the database only through services', () => {
    const leaks = routers.flatMap((file) =>
      importsOf(file)
        .filter(dataAccess)
        .map((specifier) => `${relative(root, file)} imports ${specifier}`),
    );
    expect(leaks).toEqual([]);
  });

  it('routers name a permission of shared/contracts/permissions.ts, never an inline list of roles', () => {
    const inline = routers
      .filter((file) => /authorize\.lab\(\s*\[/.test(readFileSync(file, 'utf8')))
      .map((file) => relative(root, file));
    expect(inline).toEqual([]);
  });

  it('services build no SQL of their own: queries live in repositories, transactions come through Transact', () => {
    const queries = services
      .filter((file) => /\bdb\s*[.(]|\btrx\s*\(|\.raw\s*\(/.test(readFileSync(file, 'utf8')))
      .map((file) => relative(root, file));
    expect(queries).toEqual([]);
    const handles = services.flatMap((file) =>
      [...readFileSync(file, 'utf8').matchAll(/^import (?!type )[^;]*from '([^']*(?:knex|db\/connection))';/gm)].map(
        (m) => `${relative(root, file)} imports ${m[1]}`,
      ),
    );
    expect(handles).toEqual([]);
  });

  it('services read the time from the injected clock, never new Date()', () => {
    const dated = services
      .filter((file) => /new Date\s*\(/.test(readFileSync(file, 'utf8')))
      .map((file) => relative(root, file));
    expect(dated).toEqual([]);
  });

  it('nothing on the server asks the system for the time except the clock', () => {
    const clock = join(server, 'lib', 'clock.ts');
    const dated = files
      .filter((file) => file !== clock && /new Date\s*\(\s*\)/.test(readFileSync(file, 'utf8')))
      .map((file) => relative(root, file));
    expect(dated).toEqual([]);
  });
});
