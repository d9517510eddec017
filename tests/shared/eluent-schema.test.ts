import { describe, expect, it } from 'vitest';
import { eluentFromInputSchema, eluentSchema, normaliseEluentInput } from '../../shared/schemas/eluent';

const isocratic = {
  components: [
    { solvent: 'ethyl-acetate', parts: 1 },
    { solvent: 'hexanes', parts: 4 },
  ],
  additives: [],
  mode: 'isocratic',
  steps: [],
};

describe('eluent schema', () => {
  it('accepts catalogue keys with positive parts and fills defaults', () => {
    expect(eluentSchema.parse({ components: isocratic.components })).toEqual(isocratic);
  });

  it.each([
    ['zero parts', { components: [{ solvent: 'hexanes', parts: 0 }] }],
    ['an unknown key', { components: [{ solvent: 'hexnaes', parts: 1 }] }],
    [
      'five solvents',
      { components: ['hexanes', 'heptane', 'pentane', 'toluene', 'acetone'].map((solvent) => ({ solvent, parts: 1 })) },
    ],
    [
      'a repeated solvent',
      {
        components: [
          { solvent: 'hexanes', parts: 1 },
          { solvent: 'hexanes', parts: 2 },
        ],
      },
    ],
    ['an additive above 20%', { ...isocratic, additives: [{ additive: 'triethylamine', percent: 25 }] }],
    [
      'a gradient of one step',
      { ...isocratic, mode: 'gradient', steps: [{ components: isocratic.components, columnVolumes: 3 }] },
    ],
    [
      'steps on an isocratic eluent',
      {
        ...isocratic,
        steps: [
          { components: isocratic.components, columnVolumes: null },
          { components: isocratic.components, columnVolumes: null },
        ],
      },
    ],
  ])('refuses %s', (_, candidate) => {
    expect(eluentSchema.safeParse(candidate).success).toBe(false);
  });
});

describe('eluent input with names and abbreviations', () => {
  it('resolves names of solvents and additives to catalogue keys', () => {
    const eluent = eluentFromInputSchema.parse({
      components: [
        { solvent: 'EtOAc', parts: 1 },
        { solvent: 'hexanes', parts: 4 },
      ],
      additives: [{ additive: 'TEA', percent: 1 }],
    });
    expect(eluent).toEqual({ ...isocratic, additives: [{ additive: 'triethylamine', percent: 1 }] });
  });

  it('accepts a notation string', () => {
    expect(eluentFromInputSchema.parse('EtOAc/hexanes 1:4').components).toEqual(isocratic.components);
  });

  it('reports an unknown name with its path and the closest known name', () => {
    const result = normaliseEluentInput({
      components: [
        { solvent: 'EtOAc', parts: 1 },
        { solvent: 'hexnaes', parts: 4 },
      ],
      additives: [],
      steps: [],
    });
    expect(result).toEqual({
      ok: false,
      issues: [
        {
          path: ['components', 1, 'solvent'],
          message: expect.stringContaining('hexnaes'),
          unknownWord: 'hexnaes',
          suggestion: 'hexanes',
        },
      ],
    });
  });

  it('turns unknown names into zod issues', () => {
    const result = eluentFromInputSchema.safeParse('DCM/MeOH 9:1 + 1% Et3NN');
    expect(result.success).toBe(false);
    if (!result.success) expect(result.error.issues[0].message).toMatch(/Et3NN/);
  });

  it('infers a gradient when steps are given', () => {
    const steps = [
      { components: [{ solvent: 'hexane', parts: 1 }], columnVolumes: 2 },
      {
        components: [
          { solvent: 'EtOAc', parts: 1 },
          { solvent: 'hexane', parts: 4 },
        ],
        columnVolumes: 5,
      },
    ];
    const eluent = eluentFromInputSchema.parse({ components: steps[1].components, steps });
    expect(eluent.mode).toBe('gradient');
    expect(eluent.steps[0].components).toEqual([{ solvent: 'hexanes', parts: 1 }]);
  });
});
