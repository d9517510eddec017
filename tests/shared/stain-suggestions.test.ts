import { describe, expect, it } from 'vitest';
import { suggestStains } from '../../shared/domain/stain-suggestions';

const keys = (classes: string[]) => suggestStains(classes).map((suggestion) => suggestion.stain.key);

describe('stain suggestions from compound classes', () => {
  it('puts UV 254 first for an aromatic compound (common practice: conjugated and aromatic compounds quench UV 254)', () => {
    expect(keys(['aromatic', 'ester'])[0]).toBe('uv-254');
    expect(keys(['conjugated', 'ketone'])[0]).toBe('uv-254');
  });

  it('leaves UV out for a compound with no chromophore', () => {
    expect(keys(['alcohol', 'alkene'])).not.toContain('uv-254');
  });

  it('ranks bromocresol green first for a carboxylic acid without a chromophore (common practice, standard TLC stain tables)', () => {
    expect(keys(['carboxylic-acid'])[0]).toBe('bromocresol-green');
  });

  it('ranks ninhydrin first for an aliphatic primary amine (common practice, standard TLC stain tables)', () => {
    expect(keys(['primary-amine'])[0]).toBe('ninhydrin');
  });

  it('ranks 2,4-DNP first for an aliphatic ketone (common practice, standard TLC stain tables)', () => {
    expect(keys(['ketone'])[0]).toBe('dnp');
  });

  it('suggests KMnO4 for an alkene (common practice: KMnO4 shows oxidisable groups)', () => {
    expect(keys(['alkene']).slice(0, 2)).toContain('kmno4');
  });

  it('falls back to general stains only when no class is known', () => {
    const suggestions = suggestStains([]);
    expect(suggestions.map((suggestion) => suggestion.stain.selectivity)).toEqual(suggestions.map(() => 'general'));
    expect(suggestions.length).toBeGreaterThanOrEqual(3);
  });

  it('explains each suggestion and names its source', () => {
    for (const suggestion of suggestStains(['aromatic', 'primary-amine', 'alcohol'])) {
      expect(suggestion.reasons.length, suggestion.stain.key).toBeGreaterThan(0);
      expect(suggestion.source).toMatch(/^(confirmed|common practice)/);
    }
  });
});
