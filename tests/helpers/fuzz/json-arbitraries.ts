import fc from 'fast-check';
import { exampleRecordBody } from '../records';

/** Field names the API's bodies use: bodies built from them reach past "unknown shape" into each schema's checks. */
const apiKeys = [
  'structure',
  'compoundId',
  'name',
  'technique',
  'stationaryPhase',
  'stationaryPhaseOther',
  'eluent',
  'components',
  'solvent',
  'parts',
  'additives',
  'additive',
  'percent',
  'gradient',
  'spots',
  'role',
  'rf',
  'lane',
  'visualisation',
  'method',
  'note',
  'outcome',
  'outcomeReason',
  'column',
  'diameterMm',
  'silicaG',
  'sampleMg',
  'loadMethod',
  'notebookRef',
  'notes',
  'expectedRevision',
  'email',
  'password',
  'status',
  'currentPassword',
  'newPassword',
  'recordId',
  'recordIds',
  'reason',
  'survivorId',
  'mergedIds',
  'fields',
  'targetRf',
  'solventPair',
  'weak',
  'strong',
  'phase',
  'rfTarget',
  'rfImpurity',
  'from',
  'to',
  'adsorbent',
  '__proto__',
  'constructor',
];

const hostileValue = fc.oneof(
  fc.jsonValue({ maxDepth: 2 }),
  fc.constantFrom(
    1e308,
    -1e308,
    5e-324,
    -0,
    0,
    -1,
    2 ** 31,
    2 ** 53 + 1,
    1.5,
    '1',
    '',
    ' ',
    'NaN',
    'true',
    null,
    [],
    {},
    [[[[]]]],
  ),
  fc.integer({ min: 1_000, max: 300_000 }).map((n) => 'z'.repeat(n)),
  fc.string({ unit: 'binary', maxLength: 30 }),
);

/** Objects of the API's own field names holding values of the wrong type, size or sign, sometimes nested. */
const apiShaped: fc.Arbitrary<unknown> = fc.letrec<{ node: unknown }>((tie) => ({
  node: fc.oneof(
    { depthSize: 'small', withCrossShrink: true },
    hostileValue,
    fc.dictionary(fc.constantFrom(...apiKeys), tie('node'), { maxKeys: 6 }),
    fc.array(tie('node'), { maxLength: 4 }),
  ),
})).node;

/** A valid body with one field replaced by a hostile value, dropped, or wrapped in an array. */
function mutatedBody(valid: Record<string, unknown>): fc.Arbitrary<unknown> {
  const keys = Object.keys(valid);
  return fc
    .tuple(fc.constantFrom(...keys), fc.constantFrom('replace', 'drop', 'wrap'), hostileValue)
    .map(([key, how, value]) => {
      const body: Record<string, unknown> = { ...valid };
      if (how === 'drop') delete body[key];
      else if (how === 'wrap') body[key] = [body[key]];
      else body[key] = value;
      return body;
    });
}

/** Valid bodies of the routes where a near-miss reaches deepest (paths as the route table names them). */
export const validBodies: Record<string, Record<string, unknown>> = {
  'POST /api/records': exampleRecordBody(),
  'PATCH /api/records/:id': { outcome: 'partial', outcomeReason: 'Tailing.', spots: [{ role: 'target', rf: 0.3 }] },
  'POST /api/structures/parse': { structure: 'OCc1ccccc1' },
  'POST /api/scout': {
    structure: 'OCc1ccccc1',
    targetRf: 0.3,
    solventPair: { weak: 'hexanes', strong: 'EtOAc' },
    phase: 'silica',
  },
  'POST /api/tools/column-plan': { sampleMg: 250, rfTarget: 0.3, rfImpurity: 0.45 },
  'POST /api/tools/translate-eluent': { from: 'EtOAc/hexanes 1:4', to: { weak: 'heptane', strong: 'EtOAc' } },
  'POST /api/bookmarks': { recordId: 1, note: 'fuzz' },
  'POST /api/curation/merge': { survivorId: 1, mergedIds: [2], fields: {} },
  'POST /api/curation/duplicates/dismiss': { recordIds: [1, 2], reason: 'Different batches.' },
  'POST /api/auth/login': { email: 'nobody@fuzz.invalid', password: 'not-the-password' },
  'POST /api/auth/invitations': { email: 'invitee@fuzz.invalid', role: 'viewer' },
  'PATCH /api/admin/users/:id': { role: 'viewer' },
};

/** A JSON body of the wrong shape for a route: any JSON, objects of API field names, or a mutated valid body. */
export function wrongShapedBody(route: string): fc.Arbitrary<unknown> {
  const valid = validBodies[route];
  const general = fc.oneof(fc.jsonValue({ maxDepth: 3 }), apiShaped);
  return valid ? fc.oneof(general, mutatedBody(valid), mutatedBody(valid)) : general;
}

/** Raw bodies that are not what the content type says, or too large, or nested too deep. */
export const rawBody = fc.oneof(
  fc.constantFrom('{', '{"a":', '[1,2', 'null', '"text"', '\u0000', '{"structure":"C"}garbage', '{"a":1,"a":2}', ''),
  fc.integer({ min: 2_000, max: 100_000 }).map((depth) => '['.repeat(depth) + ']'.repeat(depth)),
  fc.constant(`{"notes":"${'n'.repeat(1_100_000)}"}`),
  fc.string({ unit: 'binary', maxLength: 50 }),
);
export const contentTypes = [
  'application/json',
  'text/plain',
  'application/x-www-form-urlencoded',
  'multipart/form-data; boundary=x',
  'application/json; charset=latin1',
  'application/xml',
];
