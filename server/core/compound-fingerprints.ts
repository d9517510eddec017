import { fingerprintIdcodes, FINGERPRINT_WORDS } from '../chem';

/**
 * Fingerprints for ID codes as stored in `compounds.fingerprint`: the OpenChemLib 512-bit index
 * (16 int32, little-endian, 64 bytes), computed in the chemistry engine's shared worker pool in one batch.
 */
export async function fingerprintBytes(idcodes: string[]): Promise<Buffer[]> {
  if (idcodes.length === 0) return [];
  const fingerprints = await fingerprintIdcodes(idcodes);
  return fingerprints.map((words) => {
    const bytes = Buffer.alloc(FINGERPRINT_WORDS * 4);
    words.forEach((word, index) => bytes.writeInt32LE(word, index * 4));
    return bytes;
  });
}

/** The stored bytes back as 16 int32 (copied, so the Buffer's alignment does not matter). */
export function fingerprintFromBytes(bytes: Buffer): Int32Array {
  const words = new Int32Array(FINGERPRINT_WORDS);
  for (let index = 0; index < FINGERPRINT_WORDS; index++) words[index] = bytes.readInt32LE(index * 4);
  return words;
}

/**
 * The fingerprint of a parent ID code: a stored compound's when it has one (the very value computing would
 * give, at the cost of one indexed read), else computed in the worker pool (~11 ms there).
 */
export async function fingerprintOfIdcode(idcode: string, stored?: Buffer | null): Promise<Int32Array> {
  if (stored) return fingerprintFromBytes(stored);
  const [fingerprint] = await fingerprintIdcodes([idcode]);
  return fingerprint;
}
