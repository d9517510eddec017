import { describe, expect, it } from 'vitest';
import { readMonitoringPlate } from '../../shared/domain/plate-monitoring';

describe('readMonitoringPlate', () => {
  it(
    'when the mixture still shows the starting material and a new spot, then SM remains, the new spot ' +
      'is named and ΔCV = |1/Rf₁ − 1/Rf₂| (CV ≈ 1/Rf, common practice of flash chromatography)',
    () => {
      const out = readMonitoringPlate([
        { role: 'starting_material', rfs: [0.52] },
        { role: 'co_spot', rfs: [0.31, 0.52] },
        { role: 'mixture', rfs: [0.31, 0.53] },
      ]);
      expect(out.startingMaterialRemains).toBe(true);
      expect(out.newSpots).toEqual([0.31]);
      expect(out.coSpotResolves).toBe(true);
      expect(out.targetRf).toBe(0.31);
      expect(out.nearestRf).toBe(0.53);
      expect(out.deltaRf).toBeCloseTo(0.22, 10);
      expect(out.deltaCv).toBeCloseTo(1 / 0.31 - 1 / 0.53, 10);
      expect(out.columnPlan).toEqual({ rfTarget: 0.31, rfImpurity: 0.53 });
      expect(out.sentences.join(' ')).toContain('Starting material remains');
    },
  );

  it(
    "when the mixture has no spot at the starting material's Rf and the co-spot shows one spot, then " +
      'SM is gone and the co-spot does not resolve',
    () => {
      const out = readMonitoringPlate([
        { role: 'starting_material', rfs: [0.45] },
        { role: 'co_spot', rfs: [0.45] },
        { role: 'mixture', rfs: [0.2] },
      ]);
      expect(out.startingMaterialRemains).toBe(false);
      expect(out.coSpotResolves).toBe(false);
      expect(out.newSpots).toEqual([0.2]);
      expect(out.nearestRf).toBeNull();
      expect(out.deltaCv).toBeNull();
      expect(out.columnPlan).toEqual({ rfTarget: 0.2, rfImpurity: null });
    },
  );

  it('when the chemist names the target, then ΔRf is measured from it', () => {
    const out = readMonitoringPlate([{ role: 'mixture', rfs: [0.1, 0.25, 0.6] }], 0.6);
    expect(out.startingMaterialRemains).toBeNull();
    expect(out.coSpotResolves).toBeNull();
    expect(out.nearestRf).toBe(0.25);
    expect(out.deltaRf).toBeCloseTo(0.35, 10);
  });
});
