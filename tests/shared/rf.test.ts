import { describe, expect, it } from 'vitest';
import {
  columnVolumes,
  deltaColumnVolumes,
  retentionFactor,
  rfFromDistances,
  rfToRm,
  rmToRf,
} from '../../shared/domain/rf';

describe('Rf, RM and column volumes (textbook definitions, common practice; RM: Bate-Smith & Westall 1950)', () => {
  it('gives RM = 0 at Rf 0.5 and RM = log10(9) at Rf 0.1', () => {
    expect(rfToRm(0.5)).toBeCloseTo(0, 12);
    expect(rfToRm(0.1)).toBeCloseTo(Math.log10(9), 12);
    expect(rfToRm(0.9)).toBeCloseTo(-Math.log10(9), 12);
  });

  it('returns every Rf from 0.01 to 0.99 after a round trip through RM', () => {
    for (let rf = 0.01; rf < 0.995; rf += 0.01) expect(rmToRf(rfToRm(rf))).toBeCloseTo(rf, 12);
  });

  it('returns every RM from −3 to 3 after a round trip through Rf', () => {
    for (let rm = -3; rm <= 3; rm += 0.25) expect(rfToRm(rmToRf(rm))).toBeCloseTo(rm, 9);
  });

  it('refuses RM for Rf outside (0, 1)', () => {
    for (const rf of [0, -0.2, 1, 1.2, Number.NaN]) expect(() => rfToRm(rf)).toThrow(RangeError);
  });

  it('elutes a compound at Rf 0.25 after k = 3 and 4 column volumes', () => {
    expect(retentionFactor(0.25)).toBeCloseTo(3, 12);
    expect(columnVolumes(0.25)).toBeCloseTo(4, 12);
  });

  it('separates Rf 0.2 and 0.3 by 1.67 CV but Rf 0.6 and 0.7 by only 0.24 CV, the same ΔRf', () => {
    expect(deltaColumnVolumes(0.2, 0.3)).toBeCloseTo(5 - 10 / 3, 12);
    expect(deltaColumnVolumes(0.7, 0.6)).toBeCloseTo(1 / 0.6 - 1 / 0.7, 12);
  });
});

describe('Rf from distances on the plate', () => {
  it('divides the spot distance by the front distance', () => {
    expect(rfFromDistances(12, 40)).toEqual({ ok: true, rf: 0.3 });
    expect(rfFromDistances(40, 40)).toEqual({ ok: true, rf: 1 });
  });

  it('refuses a spot beyond the front', () => {
    expect(rfFromDistances(45, 40)).toMatchObject({ ok: false, code: 'spot-beyond-front' });
  });

  it('refuses a spot that did not leave the origin, since Rf must lie in (0, 1]', () => {
    expect(rfFromDistances(0, 40)).toMatchObject({ ok: false, code: 'rf-out-of-range' });
  });

  it('refuses a front that is not a positive distance and a negative spot', () => {
    expect(rfFromDistances(5, 0)).toMatchObject({ ok: false, code: 'front-not-positive' });
    expect(rfFromDistances(-1, 40)).toMatchObject({ ok: false, code: 'spot-negative' });
  });
});
