import { describe, expect, it } from 'vitest';
import {
  createRecordFormSchema,
  emptyRecordForm,
  recordToFormValues,
  toRecordInput,
} from '../../src/features/records/components/record-form-values';
import { mapServerErrors } from '../../src/features/records/components/server-errors';
import { ApiRequestError } from '../../src/lib/api-client';
import { recordDtoSchema } from '../../shared/schemas/record';

const filled = () => ({
  ...emptyRecordForm(),
  structure: 'OCc1ccccc1',
  spots: [{ ...emptyRecordForm().spots[0], rf: 0.28 }],
});

describe('record form values', () => {
  it('when the form is filled like the brief’s example, then the shared schema accepts the body it makes', () => {
    const result = createRecordFormSchema.safeParse(filled());
    expect(result.success).toBe(true);
    expect(result.data).toMatchObject({
      structure: 'OCc1ccccc1',
      stationaryPhase: 'silica-tlc-f254',
      spots: [{ role: 'target', rf: 0.28 }],
    });
  });

  it('when the outcome is failed without a reason, then the form asks for the reason on that field', () => {
    const result = createRecordFormSchema.safeParse({ ...filled(), outcome: 'failed' });
    expect(result.success).toBe(false);
    expect(result.error?.issues[0].path).toEqual(['outcomeReason']);
  });

  it('when an Rf input is left empty (NaN from the number input), then the shared schema reports it on spots.0.rf', () => {
    const result = createRecordFormSchema.safeParse({
      ...filled(),
      spots: [{ ...emptyRecordForm().spots[0], rf: Number.NaN }],
    });
    expect(result.success).toBe(false);
    expect(result.error?.issues[0].path).toEqual(['spots', 0, 'rf']);
  });

  it('when column details are switched off, then none are sent', () => {
    expect(toRecordInput({ ...filled(), column: { ...filled().column, silicaG: 20 } }).column).toBeNull();
  });

  it('when a stored record is shown for editing and sent back unchanged, then the body says the same thing', () => {
    const record = recordDtoSchema.parse({
      id: 7,
      status: 'active',
      compound: { id: 3, name: 'x', canonicalSmiles: 'OCc1ccccc1', formula: 'C7H8O', mw: 108.14, classes: [] },
      author: { id: 1, name: 'A' },
      technique: 'flash',
      stationaryPhase: 'silica-gel',
      stationaryPhaseLabel: 'silica gel',
      eluent: {
        components: [
          { solvent: 'hexanes', parts: 4 },
          { solvent: 'ethyl-acetate', parts: 1 },
        ],
        additives: [{ additive: 'triethylamine', percent: 1 }],
        mode: 'gradient',
        steps: [
          {
            components: [
              { solvent: 'hexanes', parts: 9 },
              { solvent: 'ethyl-acetate', parts: 1 },
            ],
            columnVolumes: 2,
          },
          {
            components: [
              { solvent: 'hexanes', parts: 4 },
              { solvent: 'ethyl-acetate', parts: 1 },
            ],
            columnVolumes: 5,
          },
        ],
      },
      eluentSummary: { notation: '', strongSolvent: null, strongPercent: null },
      spots: [{ id: 1, role: 'target', rf: 0.3, lane: null, spotDistanceMm: 15, frontDistanceMm: 50, label: null }],
      targetRf: 0.3,
      visualisations: [
        { method: 'uv-254', label: 'UV 254', note: null },
        { method: 'other', label: 'Seebach', note: 'Seebach' },
      ],
      outcome: 'clean',
      yieldPercent: 80,
      notebookRef: 'NB-1',
      photoCount: 0,
      demo: false,
      createdAt: '2026-01-01T00:00:00.000Z',
      updatedAt: '2026-01-01T00:00:00.000Z',
      stationaryPhaseOther: null,
      outcomeReason: null,
      column: {
        diameterMm: 20,
        cartridgeSize: null,
        silicaG: 24,
        sampleMg: 300,
        loadMethod: 'dry',
        fractionMl: 10,
        fractionsPooled: '5–9',
        yieldPercent: 80,
        purityNote: null,
      },
      notes: null,
      photos: [],
      contributors: [],
      mergedIntoId: null,
      retiredReason: null,
      retiredAt: null,
      importId: null,
      revision: 1,
      canEdit: true,
    });
    const body = toRecordInput(recordToFormValues(record), false);
    expect(body.eluent).toEqual({
      components: record.eluent.components,
      additives: record.eluent.additives,
      mode: 'gradient',
      steps: record.eluent.steps,
    });
    expect(body.spots).toEqual([
      { role: 'target', rf: null, spotDistanceMm: 15, frontDistanceMm: 50, lane: null, label: null },
    ]);
    expect(body.visualisation).toEqual(['uv-254', { method: 'other', note: 'Seebach' }]);
    expect(body.column).toMatchObject({
      diameterMm: 20,
      silicaG: 24,
      sampleMg: 300,
      loadMethod: 'dry',
      fractionMl: 10,
      fractionsPooled: '5–9',
      yieldPercent: 80,
    });
    expect(body.structure).toBeUndefined();
  });
});

describe('mapServerErrors', () => {
  it('when the server names body fields, then each lands on the matching form field', () => {
    const error = new ApiRequestError(400, 'invalid_input', 'x', [
      { path: 'body.spots.0.rf', message: 'Rf must lie in (0, 1].' },
      { path: 'body.eluent.steps.1.components.0.parts', message: 'bad' },
    ]);
    expect(mapServerErrors(error).fields).toEqual([
      { path: 'spots.0.rf', message: 'Rf must lie in (0, 1].' },
      { path: 'eluent.steps', message: 'bad' },
    ]);
  });

  it('when the chemistry engine refuses the structure, then its message lands on the structure field', () => {
    const error = new ApiRequestError(400, 'smiles_syntax', 'Unexpected ")" at position 4.', [
      { path: '', message: 'Unexpected ")" at position 4.', position: 4 },
    ]);
    expect(mapServerErrors(error)).toEqual({
      fields: [{ path: 'structure', message: 'Unexpected ")" at position 4.' }],
      formMessage: null,
    });
  });

  it('when the error has no field, then it becomes the form’s message', () => {
    expect(mapServerErrors(new ApiRequestError(403, 'forbidden', 'Your role does not allow this.')).formMessage).toBe(
      'Your role does not allow this.',
    );
  });
});
