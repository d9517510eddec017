import { describe, expect, it } from 'vitest';
import { cautions, cautionsFor } from '../../shared/catalogue/cautions';
import { resolveAdditive, resolvePhase, resolveSolvent, resolveStain } from '../../shared/catalogue/lookup';
import { stationaryPhaseByKey } from '../../shared/catalogue/stationary-phases';

const keyOf = (resolution: { ok: true; value: { key: string } } | { ok: false }) =>
  resolution.ok ? resolution.value.key : null;

describe('resolving names a chemist writes (common practice abbreviations)', () => {
  it.each([
    ['EtOAc', 'ethyl-acetate'],
    ['AcOEt', 'ethyl-acetate'],
    ['ethyl acetate', 'ethyl-acetate'],
    ['EA', 'ethyl-acetate'],
    ['Et2O', 'diethyl-ether'],
    ['ether', 'diethyl-ether'],
    ['Et₂O', 'diethyl-ether'],
    ['DCM', 'dichloromethane'],
    ['CH2Cl2', 'dichloromethane'],
    ['methylene chloride', 'dichloromethane'],
    ['MeOH', 'methanol'],
    ['hexanes', 'hexanes'],
    ['hexane', 'hexanes'],
    ['hex', 'hexanes'],
    ['PE', 'petroleum-ether'],
    ['pet ether', 'petroleum-ether'],
    ['petroleum ether', 'petroleum-ether'],
    ['petrol', 'petroleum-ether'],
    ['cHex', 'cyclohexane'],
    ['TBME', 'mtbe'],
    ['2-MeTHF', '2-methyltetrahydrofuran'],
    ['IPA', 'isopropanol'],
    ['MeCN', 'acetonitrile'],
  ])('reads "%s" as %s', (name, key) => {
    expect(keyOf(resolveSolvent(name))).toBe(key);
  });

  it('ignores case, spacing, dots and hyphens', () => {
    for (const name of ['ETOAC', 'ethyl   Acetate', ' et2o ', 'Pet. Ether', 'n hexane', 'METHYLENE-CHLORIDE']) {
      expect(resolveSolvent(name).ok, name).toBe(true);
    }
  });

  it('suggests the closest known name for a misspelt one', () => {
    expect(resolveSolvent('methanl')).toMatchObject({ ok: false, suggestion: 'methanol' });
    expect(resolveSolvent('tolune')).toMatchObject({ ok: false, suggestion: 'toluene' });
    expect(resolveSolvent('dichlormethane')).toMatchObject({ ok: false, suggestion: 'dichloromethane' });
  });

  it('gives no suggestion when nothing is close', () => {
    expect(resolveSolvent('zzqx')).toEqual({ ok: false, input: 'zzqx', suggestion: null });
  });

  it.each([
    ['UV 254', 'uv-254'],
    ['UV254', 'uv-254'],
    ['UV (254 nm)', 'uv-254'],
    ['uv 365', 'uv-365'],
    ['permanganate', 'kmno4'],
    ['KMnO4', 'kmno4'],
    ['PMA', 'pma'],
    ['CAM', 'cam'],
    ["Hanessian's stain", 'cam'],
    ['2,4-DNP', 'dnp'],
    ['iodine', 'iodine'],
  ])('reads the visualisation "%s" as %s', (name, key) => {
    expect(keyOf(resolveStain(name))).toBe(key);
  });

  it.each([
    ['silica', 'silica-gel'],
    ['SiO2', 'silica-gel'],
    ['Al2O3', 'alumina-neutral'],
    ['basic alumina', 'alumina-basic'],
    ['C18', 'c18'],
    ['RP-18', 'c18'],
    ['F254', 'silica-tlc-f254'],
  ])('reads the stationary phase "%s" as %s', (name, key) => {
    expect(keyOf(resolvePhase(name))).toBe(key);
  });

  it('gives silica and alumina phases their adsorbent for the strength model, and none to C18', () => {
    expect(stationaryPhaseByKey('silica-gel')?.adsorbent).toBe('silica');
    expect(stationaryPhaseByKey('alumina-basic')?.adsorbent).toBe('alumina');
    expect(stationaryPhaseByKey('c18')?.adsorbent).toBeNull();
  });

  it.each([
    ['TEA', 'triethylamine'],
    ['NEt3', 'triethylamine'],
    ['Et3N', 'triethylamine'],
    ['AcOH', 'acetic-acid'],
    ['aq. NH3', 'ammonia'],
    ['NH4OH', 'ammonia'],
    ['TFA', 'trifluoroacetic-acid'],
    ['HCO2H', 'formic-acid'],
  ])('reads the additive "%s" as %s', (name, key) => {
    expect(keyOf(resolveAdditive(name))).toBe(key);
  });
});

describe('cautions', () => {
  it('defer every text to safety data sheets, local rules and the safety office', () => {
    for (const caution of Object.values(cautions)) {
      expect(caution.text).toMatch(/safety data sheets/);
      expect(caution.text).toMatch(/local rules/);
      expect(caution.text).toMatch(/safety office/);
    }
  });

  it('name peroxide and flammability hazards for diethyl ether, and pressurised glass and silica dust for a column', () => {
    const keys = cautionsFor({ solventKeys: ['diethyl-ether', 'hexanes'], flashColumn: true }).map(
      (caution) => caution.key,
    );
    expect(keys).toEqual(['flammable-solvent', 'peroxide-former', 'toxic-solvent', 'pressurised-glass', 'silica-dust']);
  });

  it('name UV lamps for UV and stains and heat guns for dips', () => {
    expect(cautionsFor({ stainKeys: ['uv-254'] }).map((caution) => caution.key)).toEqual(['uv-lamp']);
    expect(cautionsFor({ stainKeys: ['kmno4'] }).map((caution) => caution.key)).toEqual(['stains-and-heat']);
  });

  it('stay silent for water alone on a plate', () => {
    expect(cautionsFor({ solventKeys: ['water'] })).toEqual([]);
  });
});
