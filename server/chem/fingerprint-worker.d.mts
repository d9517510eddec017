import type { Molecule } from 'openchemlib';

/** Types for fingerprint-worker.mjs (plain JavaScript so it runs as a worker everywhere). */
export declare const FINGERPRINT_WORDS: 16;
export declare const WORKER_FLAG: 'rfolioFingerprintWorker';
export declare function fingerprintOf(mol: Molecule): Int32Array;
export declare function searchGraphOf(mol: Molecule): Uint8Array;
