import pg from 'pg';
import type { CachedLibrary } from './library-cache';

/**
 * Invented names for the generated compounds (three words from short lists, then the number), so text
 * search meets repeated chemical words the way a real base does. Not real compound names.
 */
const substituents = [
  'methyl',
  'ethyl',
  'propyl',
  'butyl',
  'fluoro',
  'chloro',
  'bromo',
  'methoxy',
  'nitro',
  'cyano',
  'amino',
  'hydroxy',
  'acetyl',
  'benzoyl',
  'tosyl',
  'trifluoromethyl',
];
const cores = [
  'phenyl',
  'pyridyl',
  'thienyl',
  'furyl',
  'naphthyl',
  'indolyl',
  'piperidinyl',
  'morpholinyl',
  'piperazinyl',
  'cyclohexyl',
  'benzyl',
  'quinolinyl',
];
const kinds = ['amide', 'ester', 'sulfonamide', 'ether', 'amine', 'urea', 'carbamate', 'biaryl'];

export const benchName = (i: number) =>
  `${substituents[i % substituents.length]}${cores[Math.floor(i / substituents.length) % cores.length]} ` +
  `${kinds[Math.floor(i / 7) % kinds.length]} ${i}`;

/** Text queries with one typo each (two letters swapped in the first word), e.g. "mehtylphenyl amide". */
export function queryWords(count: number): string[] {
  return Array.from({ length: count }, (_, i) => {
    const [first, kind] = benchName(i * 37 + 11).split(' ');
    const at = 1 + (i % (first.length - 3));
    return `${first.slice(0, at)}${first[at + 1]}${first[at]}${first.slice(at + 2)} ${kind}`;
  });
}

const BATCH = 5_000;

/** One compound row (stored fingerprint from the cache, placeholder descriptors) and one TLC record per library entry. */
export async function insertLibrary(url: string, library: CachedLibrary): Promise<void> {
  const client = new pg.Client({ connectionString: url });
  await client.connect();
  try {
    const author = await client.query(
      "INSERT INTO users (email, name, role, password_hash) VALUES ('bench-author@bench.invalid', " +
        "'Bench author', 'member', 'x') RETURNING id",
    );
    for (let start = 0; start < library.smiles.length; start += BATCH) {
      const end = Math.min(start + BATCH, library.smiles.length);
      const range = Array.from({ length: end - start }, (_, k) => start + k);
      await client.query(
        `INSERT INTO compounds (idcode, name, input_structure, canonical_smiles, molfile, formula, mw, exact_mass, clogp, tpsa, hbd, hba,
           rotatable_bonds, aromatic_rings, stereocentres, charge, classes, fingerprint)
         SELECT idcode, name, smiles, smiles, '', '', 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, '{}', fingerprint
         FROM unnest($1::text[], $2::text[], $3::text[], $4::bytea[]) AS t(idcode, name, smiles, fingerprint)`,
        [
          range.map((i) => library.idcodes[i]),
          range.map(benchName),
          range.map((i) => library.smiles[i]),
          range.map((i) => Buffer.from(library.fingerprints[i], 'base64')),
        ],
      );
    }
    await client.query(
      `INSERT INTO condition_records (compound_id, author_id, technique, stationary_phase, eluent, solvent_keys,
        strong_percent, target_rf, outcome, notebook_ref, content_hash)
       SELECT id, $1, 'tlc', 'silica-gel',
         '{"components":[{"solvent":"ethyl-acetate","parts":1},{"solvent":"hexanes","parts":3}],
           "additives":[],"mode":"isocratic","steps":[]}'::jsonb,
         ARRAY['ethyl-acetate','hexanes'], 25, 0.3, 'clean', 'B-' || id, md5(id::text)
       FROM compounds`,
      [author.rows[0].id],
    );
  } finally {
    await client.end();
  }
}
