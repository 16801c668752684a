import { readdirSync, readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';

// The engine runs unchanged in the browser, a Web Worker and Node: its source files may import
// only each other and zod. Test files (which read fixtures) are exempt.
const folder = dirname(fileURLToPath(import.meta.url));
const forbidden = /^(node:|fs$|fs\/|path$|react|express|knex|better-sqlite3|http|https|child_process|os$|crypto$)/;

function sourceFiles(directory: string): string[] {
  return readdirSync(directory, { withFileTypes: true }).flatMap((entry) => {
    const path = join(directory, entry.name);
    if (entry.isDirectory()) return sourceFiles(path);
    return entry.name.endsWith('.ts') && !entry.name.endsWith('.test.ts') ? [path] : [];
  });
}

describe('shared/uncertainty boundaries', () => {
  it('imports nothing from Node, the DOM, I/O or frameworks', () => {
    const offenders: string[] = [];
    for (const file of sourceFiles(folder)) {
      const text = readFileSync(file, 'utf8');
      for (const match of text.matchAll(
        /(?:import|export)[^'"]*?from\s*['"]([^'"]+)['"]|import\(\s*['"]([^'"]+)['"]\s*\)|require\(\s*['"]([^'"]+)['"]\s*\)/g,
      )) {
        const specifier = match[1] ?? match[2] ?? match[3];
        const allowed = specifier.startsWith('.') || specifier === 'zod';
        if (!allowed || forbidden.test(specifier)) offenders.push(`${file}: ${specifier}`);
      }
      if (/\b(window|document|process|localStorage)\./.test(text)) offenders.push(`${file}: uses a host global`);
    }
    expect(offenders).toEqual([]);
    expect(sourceFiles(folder).length).toBeGreaterThan(5);
  });
});
