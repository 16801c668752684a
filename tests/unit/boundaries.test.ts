import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join, relative } from 'node:path';
import { describe, expect, it } from 'vitest';

/** Layer rules (the engine imports no Node, DOM or framework; src and server never import each other), checked by reading every import in the tree. */
const root = join(import.meta.dirname, '..', '..');

function sourceFiles(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const path = join(dir, name);
    if (statSync(path).isDirectory()) return name === 'node_modules' ? [] : sourceFiles(path);
    return /\.(ts|tsx)$/.test(name) ? [path] : [];
  });
}

function imports(file: string): string[] {
  const text = readFileSync(file, 'utf8');
  return [...text.matchAll(/(?:import|export)[^'"]*?from\s+['"]([^'"]+)['"]|import\(\s*['"]([^'"]+)['"]\s*\)/g)].map(
    (m) => m[1] ?? m[2],
  );
}

/** Production files only: tests may read fixtures from disk. */
function violations(dir: string, forbidden: (specifier: string) => boolean): string[] {
  return sourceFiles(join(root, dir))
    .filter((file) => !/\.test\.tsx?$/.test(file))
    .flatMap((file) =>
      imports(file)
        .filter(forbidden)
        .map((specifier) => `${relative(root, file)} imports ${specifier}`),
    );
}

describe('layer boundaries', () => {
  it('the client never imports the server', () => {
    expect(violations('src', (s) => /(^|\/)server(\/|$)/.test(s))).toEqual([]);
  });

  it('the server never imports the client', () => {
    expect(violations('server', (s) => /(^|\.\.\/)src(\/|$)/.test(s))).toEqual([]);
  });

  it('shared code imports neither side, nor Node, the DOM or a framework', () => {
    expect(
      violations(
        'shared',
        (s) => /(^|\/)(server|src)(\/|$)/.test(s) || /^(node:|fs$|path$|react|express|knex|react-router)/.test(s),
      ),
    ).toEqual([]);
  });
});
