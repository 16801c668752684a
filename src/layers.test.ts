import { readdirSync, readFileSync } from 'node:fs';
import { dirname, join, relative, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';

const SRC = resolve('src');

function sourceFiles(directory: string): string[] {
  return readdirSync(directory, { withFileTypes: true }).flatMap((entry) => {
    const path = join(directory, entry.name);
    if (entry.isDirectory()) return sourceFiles(path);
    return /\.tsx?$/.test(entry.name) && !/\.test\.tsx?$/.test(entry.name) ? [path] : [];
  });
}

/** Every relative import of a file, resolved to a path under src/ (such as `features/auth/api/get-me`). */
function importsOf(file: string): string[] {
  const text = readFileSync(file, 'utf8');
  return [...text.matchAll(/from\s+'(\.[^']+)'/g)].map((match) => relative(SRC, resolve(dirname(file), match[1])));
}

/** The client's one-way layers (bulletproof-react): app → features → components, lib, config. */
describe('client layers', () => {
  const files = sourceFiles(SRC).map((file) => ({ file: relative(SRC, file), imports: importsOf(file) }));

  it('reads the client sources (so the checks below are not vacuous)', () => {
    expect(files.filter(({ file }) => file.startsWith('features/')).length).toBeGreaterThan(10);
    expect(files.some(({ imports }) => imports.includes('features/auth/api/get-me'))).toBe(true);
  });

  it('keeps each feature to itself', () => {
    const crossings = files.flatMap(({ file, imports }) => {
      const [top, feature] = file.split('/');
      if (top !== 'features') return [];
      return imports
        .filter((target) => target.startsWith('features/') && target.split('/')[1] !== feature)
        .map((target) => `${file} → ${target}`);
    });
    expect(crossings).toEqual([]);
  });

  it('lets only the app layer import the app layer, and nothing below import features', () => {
    const upward = files.flatMap(({ file, imports }) => {
      const top = file.split('/')[0];
      if (top === 'app' || file === 'main.tsx') return [];
      return imports
        .filter((target) => target.startsWith('app') || (top !== 'features' && target.startsWith('features/')))
        .map((target) => `${file} → ${target}`);
    });
    expect(upward).toEqual([]);
  });
});
