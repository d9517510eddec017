import type { Migration } from '../migrator';

export const up: Migration = async ({ context: qi }) => {
  await qi.sequelize.query(`
    CREATE TABLE compounds (
      id SERIAL PRIMARY KEY,
      idcode TEXT NOT NULL UNIQUE,
      name TEXT,
      synonyms TEXT[] NOT NULL DEFAULT '{}',
      input_structure TEXT NOT NULL,
      canonical_smiles TEXT NOT NULL,
      molfile TEXT NOT NULL,
      formula TEXT NOT NULL,
      mw DOUBLE PRECISION NOT NULL,
      exact_mass DOUBLE PRECISION NOT NULL,
      clogp DOUBLE PRECISION NOT NULL,
      tpsa DOUBLE PRECISION NOT NULL,
      hbd INTEGER NOT NULL,
      hba INTEGER NOT NULL,
      rotatable_bonds INTEGER NOT NULL,
      aromatic_rings INTEGER NOT NULL,
      stereocentres INTEGER NOT NULL,
      charge INTEGER NOT NULL,
      classes TEXT[] NOT NULL DEFAULT '{}',
      fingerprint BYTEA,
      created_by INTEGER REFERENCES users(id),
      created_at TIMESTAMPTZ NOT NULL DEFAULT now(),
      updated_at TIMESTAMPTZ NOT NULL DEFAULT now()
    );
    CREATE INDEX compounds_classes ON compounds USING GIN (classes);
    CREATE INDEX compounds_name_lower ON compounds (lower(name));
  `);
};

export const down: Migration = async ({ context: qi }) => {
  await qi.sequelize.query('DROP TABLE compounds;');
};
