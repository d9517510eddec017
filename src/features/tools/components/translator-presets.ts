import type { TranslateEluentInput } from '../../../../shared/schemas/tools';

export interface PairPreset {
  key: string;
  label: string;
  to: TranslateEluentInput['to'];
}

/**
 * Pairs to translate into, greener swaps first (common practice: heptane for hexanes, EtOAc/EtOH 3 : 1 in
 * heptane or EtOAc/EtOH for DCM/MeOH, MTBE for diethyl ether).
 */
export const pairPresets: PairPreset[] = [
  { key: 'heptane-etoac', label: 'EtOAc / heptane', to: { weak: 'heptane', strong: 'EtOAc' } },
  {
    key: 'heptane-etoac-etoh',
    label: 'EtOAc–EtOH 3 : 1 / heptane',
    to: {
      weak: 'heptane',
      strong: [
        { solvent: 'EtOAc', parts: 3 },
        { solvent: 'EtOH', parts: 1 },
      ],
    },
  },
  { key: 'etoac-etoh', label: 'EtOH / EtOAc', to: { weak: 'EtOAc', strong: 'EtOH' } },
  { key: 'heptane-mtbe', label: 'MTBE / heptane', to: { weak: 'heptane', strong: 'MTBE' } },
  { key: 'heptane-acetone', label: 'acetone / heptane', to: { weak: 'heptane', strong: 'acetone' } },
  { key: 'hexanes-etoac', label: 'EtOAc / hexanes', to: { weak: 'hexanes', strong: 'EtOAc' } },
  { key: 'hexanes-et2o', label: 'Et2O / hexanes', to: { weak: 'hexanes', strong: 'Et2O' } },
  { key: 'dcm-meoh', label: 'MeOH / DCM', to: { weak: 'DCM', strong: 'MeOH' } },
];
