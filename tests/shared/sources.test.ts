import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join, relative } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { solvents } from '../../shared/catalogue/solvents';
import { stains } from '../../shared/catalogue/stains';
import { planColumn, stillSource } from '../../shared/domain/column-plan';
import { defaultActivity, strengthEquation } from '../../shared/domain/eluent-strength';
import { translateEluent } from '../../shared/domain/translate-eluent';

/**
 * Every source the app shows names something a reader can open (docs/references.md lists them) or says plainly that
 * it is from memory, common practice or an estimate; no internal file or provenance code reaches the user.
 */

const root = fileURLToPath(new URL('../../', import.meta.url));
const references = readFileSync(join(root, 'docs/references.md'), 'utf8');

/** Short forms the app cites; each must be listed in docs/references.md. */
const shortForms = [
  'Still, Kahn & Mitra 1978',
  'Snyder 1968',
  'Sadek',
  'Soczewiński 1969',
  'Bate-Smith & Westall 1950',
];
const plainly = /from memory|common practice|estimate/;
const internal = /REFERENCE|confirmed|from-memory|heuristic/i;

function shownSources(): string[] {
  const plan = planColumn({ sampleMg: 500, rfTarget: 0.3, rfImpurity: 0.45 });
  const translation = translateEluent(
    [
      { solvent: 'hexanes', parts: 4 },
      { solvent: 'ethyl-acetate', parts: 1 },
    ],
    {
      weak: [{ solvent: 'heptane', parts: 1 }],
      strong: [{ solvent: 'ethyl-acetate', parts: 1 }],
    },
  );
  if (!translation.ok) throw new Error(translation.message);
  return [
    ...solvents.flatMap((solvent) => [
      solvent.physicalSource,
      ...Object.values(solvent.strength).flatMap((value) => (value ? [value.source] : [])),
      ...(solvent.adsorbedArea ? [solvent.adsorbedArea.source] : []),
    ]),
    ...stains.map((stain) => stain.source),
    ...Object.values(defaultActivity).map((value) => value.source),
    ...Object.values(plan.sources),
    stillSource,
    strengthEquation,
    ...translation.values.map((item) => item.value.source),
    ...translation.warnings,
  ];
}

function filesUnder(directory: string): string[] {
  return readdirSync(directory).flatMap((name) => {
    const path = join(directory, name);
    if (name === 'node_modules' || name === 'fixtures') return [];
    return statSync(path).isDirectory() ? filesUnder(path) : /\.(ts|tsx|mts|mjs|md)$/.test(name) ? [path] : [];
  });
}

describe('sources a reader can open', () => {
  it('lists every short form the app cites in docs/references.md', () => {
    for (const form of shortForms) expect(references, form).toContain(form);
  });

  it('shows no source that names an internal file or provenance code', () => {
    const shown = shownSources();
    expect(shown.length).toBeGreaterThan(60);
    expect(shown.filter((text) => internal.test(text))).toEqual([]);
  });

  it('names a published source, or says from memory, common practice or estimate, for every value it shows', () => {
    const advice = (text: string) => text.startsWith('Equal ε° matches') || text.startsWith('Some ε°');
    const shown = shownSources().filter((text) => !advice(text));
    expect(shown.length).toBeGreaterThan(60);
    const unsourced = shown.filter(
      (text) => !plainly.test(text) && !shortForms.some((form) => text.includes(form.split(' ')[0])),
    );
    expect(unsourced).toEqual([]);
  });

  it('cites no "REFERENCE.md" anywhere in the code, seeds or tests', () => {
    const files = ['shared', 'server', 'src', 'seeders', 'tests'].flatMap((folder) => filesUnder(join(root, folder)));
    expect(files.length).toBeGreaterThan(200);
    const citing = files
      .map((path) => relative(root, path))
      .filter((path) => path !== 'tests/shared/sources.test.ts')
      .filter((path) => readFileSync(join(root, path), 'utf8').includes('REFERENCE.md'));
    expect(citing).toEqual([]);
  });
});
