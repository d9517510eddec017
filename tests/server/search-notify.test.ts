import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import pg from 'pg';
import { createApp } from '../../server/http/app';
import { analyseStructure } from '../../server/core/compound-analysis';
import { fingerprintBytes } from '../../server/core/compound-fingerprints';
import { searchIndexes } from '../../server/features/search/process-indexes';
import { agentFor, type Agent } from '../helpers/agent';
import { recordHits, searchFor, uniqueWord } from '../helpers/search';

/**
 * Another server process is played by a raw pg client of its own: it writes a compound and a record with
 * plain SQL, the way any other process (or an import script) would, and never touches this process's
 * memory. The search_changes triggers announce the rows with NOTIFY.
 */
const { app, close } = createApp();
let viewer: Agent;
let other: pg.Client;

async function insertElsewhere(
  smiles: string,
  name: string,
  notes: string,
): Promise<{ compoundId: number; recordId: number }> {
  const analysis = analyseStructure(smiles);
  const [fingerprint] = await fingerprintBytes([analysis.idcode]);
  const compound = await other.query(
    `INSERT INTO compounds (idcode, name, input_structure, canonical_smiles, molfile, formula, mw, exact_mass, clogp, tpsa, hbd, hba,
       rotatable_bonds, aromatic_rings, stereocentres, charge, classes, fingerprint)
     VALUES ($1, $2, $3, $4, $5, $6, $7, $8, $9, $10, $11, $12, $13, $14, $15, $16, $17, $18) RETURNING id`,
    [
      analysis.idcode,
      name,
      smiles,
      analysis.canonicalSmiles,
      analysis.molfile,
      analysis.formula,
      analysis.mw,
      analysis.exactMass,
      analysis.clogp,
      analysis.tpsa,
      analysis.hbd,
      analysis.hba,
      analysis.rotatableBonds,
      analysis.aromaticRings,
      analysis.stereocentres,
      analysis.charge,
      analysis.classes,
      fingerprint,
    ],
  );
  const compoundId = compound.rows[0].id as number;
  const record = await other.query(
    `INSERT INTO condition_records (compound_id, author_id, technique, stationary_phase, eluent, solvent_keys,
      target_rf, outcome, notes, content_hash)
     VALUES ($1, $2, 'tlc', 'silica-gel', $3, ARRAY['ethyl-acetate','hexanes'], 0.3, 'clean', $4, md5($4)) RETURNING id`,
    [
      compoundId,
      viewer.user!.id,
      JSON.stringify({
        components: [
          { solvent: 'ethyl-acetate', parts: 1 },
          { solvent: 'hexanes', parts: 3 },
        ],
        additives: [],
        mode: 'isocratic',
        steps: [],
      }),
      notes,
    ],
  );
  return { compoundId, recordId: record.rows[0].id as number };
}

beforeAll(async () => {
  viewer = await agentFor(app, 'viewer');
  other = new pg.Client({ connectionString: process.env.DATABASE_URL });
  await other.connect();
  await searchFor(viewer, { q: 'warm up' });
});
afterAll(async () => {
  await other.end();
  await close();
});

describe('search indexes across processes', () => {
  it(
    'when another connection inserts a compound and a record, then NOTIFY brings both into this ' +
      'process’s indexes without a search asking',
    async () => {
      const indexes = await searchIndexes();
      const word = uniqueWord();
      const { compoundId, recordId } = await insertElsewhere(
        'CCCCCCCCCCCCCCCCCCCCCCCCCCCCCCCCc1ccncc1',
        `dotriacontylpyridine ${word}`,
        `elsewhere ${word}`,
      );
      await vi.waitFor(
        () => {
          expect(indexes.structures.fingerprints.has(compoundId)).toBe(true);
          expect(indexes.text.search(`dotriacontylpyridine ${word}`).compounds.has(compoundId)).toBe(true);
          expect(indexes.text.search(`elsewhere ${word}`).records.has(recordId)).toBe(true);
        },
        { timeout: 5_000, interval: 20 },
      );
      const similar = recordHits(
        await searchFor(viewer, {
          mode: 'similar',
          structure: 'CCCCCCCCCCCCCCCCCCCCCCCCCCCCCCCCc1ccncc1',
          threshold: 0.99,
        }),
      );
      expect(similar.map((hit) => hit.recordId)).toContain(recordId);
    },
  );

  it(
    'when the listening connection is killed and a compound is written while it is away, then it ' +
      'reconnects and catches up from the change log',
    async () => {
      const indexes = await searchIndexes();
      const before = indexes.listener.backendPid;
      expect(before).toBeGreaterThan(0);
      await other.query('SELECT pg_terminate_backend($1)', [before]);
      await vi.waitFor(() => expect(indexes.listener.listening).toBe(false), { timeout: 5_000, interval: 5 });
      const word = uniqueWord();
      const { compoundId } = await insertElsewhere(
        'CCCCCCCCCCCCCCCCCCCCCCCCCCCCCCCCCc1ccncc1',
        `tritriacontylpyridine ${word}`,
        `away ${word}`,
      );
      await vi.waitFor(
        () => {
          expect(indexes.listener.listening).toBe(true);
          expect(indexes.structures.fingerprints.has(compoundId)).toBe(true);
        },
        { timeout: 10_000, interval: 20 },
      );
      expect(indexes.listener.backendPid).not.toBe(before);
    },
  );

  it('when a record is retired by another connection, then a search right after no longer returns it', async () => {
    const word = uniqueWord();
    const { recordId } = await insertElsewhere(
      'CCCCCCCCCCCCCCCCCCCCCCCCCCCCCCCCCCc1ccncc1',
      `tetratriacontylpyridine ${word}`,
      `retired elsewhere ${word}`,
    );
    expect(recordHits(await searchFor(viewer, { q: `retired elsewhere ${word}` })).map((hit) => hit.recordId)).toEqual([
      recordId,
    ]);
    await other.query("UPDATE condition_records SET status = 'retired' WHERE id = $1", [recordId]);
    expect((await searchFor(viewer, { q: `retired elsewhere ${word}` })).total).toBe(0);
  });
});
