import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join, relative } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';

/**
 * Checks on the checks (the product's rule: no check that cannot fail). A `list.every(...)` is true for an empty
 * list, so the list's size or content must be asserted just before; "is defined" and "is truthy" pass for any
 * wrong value, so tests assert the value itself.
 */

const root = fileURLToPath(new URL('../../', import.meta.url));

function testFiles(directory: string): string[] {
  return readdirSync(directory).flatMap((name) => {
    const path = join(directory, name);
    if (statSync(path).isDirectory()) return name === 'fixtures' ? [] : testFiles(path);
    return /\.test\.tsx?$/.test(name) ? [path] : [];
  });
}

const files = testFiles(join(root, 'tests')).map((path) => ({
  name: relative(root, path),
  lines: readFileSync(path, 'utf8').split('\n'),
}));

describe('assertions in the test suite', () => {
  it('reads the whole suite', () => {
    expect(files.length).toBeGreaterThan(100);
  });

  it('never asserts only that a value is defined or truthy', () => {
    const weak = files.flatMap(({ name, lines }) =>
      lines.flatMap((line, index) => (/\.toBeDefined\(\)|\.toBeTruthy\(\)/.test(line) ? [`${name}:${index + 1}`] : [])),
    );
    expect(weak).toEqual([]);
  });

  it('checks that a list is not empty before asserting something of every element', () => {
    const unchecked: string[] = [];
    let seen = 0;
    for (const { name, lines } of files) {
      lines.forEach((line, index) => {
        const match = /expect\(\s*([\w.$]+(?:\([^)]*\))?)\.every\(/.exec(line);
        if (!match) return;
        seen += 1;
        // `items.every` names the list; `Object.values(x).every` is checked through x.
        const list = /\(([^)]*)\)/.exec(match[1])?.[1] ?? match[1];
        const before = lines.slice(Math.max(0, index - 8), index);
        const sized = before.some(
          (earlier) => earlier.includes(list) && /\.length|toHaveLength|toEqual\(|\[0\]/.test(earlier),
        );
        if (!sized) unchecked.push(`${name}:${index + 1} ${line.trim()}`);
      });
    }
    expect(seen).toBeGreaterThan(5);
    expect(unchecked).toEqual([]);
  });
});
