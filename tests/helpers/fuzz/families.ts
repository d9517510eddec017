import fc from 'fast-check';
import { getCase, jsonCase, recordBody, uploadCase, uri, urlFor, write, type FuzzCase } from './cases';
import { molfileLike, realSmiles, smilesLike } from './chem-arbitraries';
import type { FuzzContext } from './context';
import { contentTypes, rawBody, validBodies, wrongShapedBody } from './json-arbitraries';
import { csvLike, eluentLike, hostileFileName } from './text-arbitraries';

const structureText = fc.oneof({ weight: 3, arbitrary: smilesLike }, { weight: 1, arbitrary: molfileLike });

/** SMILES- and molfile-like text through every endpoint that reads a structure. */
export const structureCases = (ctx: FuzzContext): fc.Arbitrary<FuzzCase> =>
  fc.oneof(
    structureText.map((structure) =>
      jsonCase('POST /api/structures/parse', 'post', '/api/structures/parse', { structure }),
    ),
    fc
      .tuple(fc.constantFrom('similar', 'substructure'), structureText)
      .map(([mode, structure]) => getCase('GET /api/search', `/api/search?mode=${mode}&structure=${uri(structure)}`)),
    structureText.map((structure) => jsonCase('POST /api/scout', 'post', '/api/scout', { structure })),
    structureText.map((structure) => jsonCase('POST /api/records', 'post', '/api/records', recordBody({ structure }))),
    structureText.map((structure) =>
      jsonCase('PATCH /api/records/:id', 'patch', `/api/records/${ctx.recordIds[1]}`, { structure }),
    ),
  );

/** Eluent notation typed by hand, through record creation and edits, the eluent translator and Scout's pair. */
export const eluentCases = (ctx: FuzzContext): fc.Arbitrary<FuzzCase> =>
  fc.oneof(
    eluentLike.map((eluent) =>
      jsonCase('POST /api/records', 'post', '/api/records', recordBody({ structure: realSmiles[0], eluent })),
    ),
    eluentLike.map((eluent) =>
      jsonCase('PATCH /api/records/:id', 'patch', `/api/records/${ctx.recordIds[1]}`, { eluent }),
    ),
    eluentLike.map((from) =>
      jsonCase('POST /api/tools/translate-eluent', 'post', '/api/tools/translate-eluent', {
        from,
        to: { weak: 'heptane', strong: 'EtOAc' },
      }),
    ),
    fc
      .tuple(eluentLike, eluentLike)
      .map(([weak, strong]) =>
        jsonCase('POST /api/scout', 'post', '/api/scout', { structure: realSmiles[1], solventPair: { weak, strong } }),
      ),
  );

/** CSV files for the import: previews (nothing written) and, one in eight, real imports. */
export const csvCases = (): fc.Arbitrary<FuzzCase> =>
  fc
    .tuple(
      csvLike,
      fc.oneof({ weight: 3, arbitrary: fc.constant('history.csv') }, { weight: 1, arbitrary: hostileFileName }),
      fc.integer({ min: 0, max: 7 }),
    )
    .map(([content, name, roll]) =>
      uploadCase('POST /api/imports', roll === 0 ? '/api/imports?wait=10000' : '/api/imports?dryRun=1', {
        bytes: Buffer.isBuffer(content) ? content : Buffer.from(content),
        name,
        type: 'text/csv',
        field: 'file',
      }),
    );

const oversize = (bytes: number) => Buffer.alloc(bytes, 0x41);

/** Photos and import files of the wrong type, size, field or name, including path-like and NUL-bearing names. */
export const uploadCases = (ctx: FuzzContext): fc.Arbitrary<FuzzCase> => {
  const photoUrl = `/api/records/${ctx.recordIds[0]}/photos`;
  const photoBytes = fc.oneof(
    fc.uint8Array({ maxLength: 2_000 }).map((bytes) => Buffer.from(bytes)),
    fc.nat({ max: ctx.png.length }).map((at) => ctx.png.subarray(0, at)),
    fc.constantFrom(
      Buffer.from('<svg xmlns="http://www.w3.org/2000/svg"><script>alert(1)</script></svg>'),
      Buffer.from('GIF89a'),
      Buffer.from('%PDF-1.4'),
      Buffer.alloc(0),
    ),
    fc.constant(ctx.png),
  );
  return fc.oneof(
    {
      weight: 6,
      arbitrary: fc
        .tuple(
          photoBytes,
          hostileFileName,
          fc.constantFrom('image/png', 'image/jpeg', 'text/html', 'application/x-msdownload', undefined),
          fc.constantFrom('photo', 'photo', 'file', ''),
        )
        .map(([bytes, name, type, field]) =>
          uploadCase('POST /api/records/:id/photos', photoUrl, { bytes, name, type, field }),
        ),
    },
    {
      weight: 2,
      arbitrary: fc
        .tuple(fc.constant(ctx.png), hostileFileName, fc.constantFrom('photo', 'file', 'mapping'))
        .map(([bytes, name, field]) =>
          uploadCase('POST /api/imports', '/api/imports?dryRun=1', { bytes, name, type: 'image/png', field }),
        ),
    },
    {
      weight: 1,
      arbitrary: fc.constant(
        uploadCase('POST /api/records/:id/photos', photoUrl, {
          bytes: oversize(10 * 1024 * 1024 + 1),
          name: 'huge.png',
          type: 'image/png',
          field: 'photo',
        }),
      ),
    },
    {
      weight: 1,
      arbitrary: fc.constant(
        uploadCase('POST /api/imports', '/api/imports?dryRun=1', {
          bytes: oversize(20 * 1024 * 1024 + 1),
          name: 'huge.csv',
          type: 'text/csv',
          field: 'file',
        }),
      ),
    },
  );
};

/** JSON bodies of the wrong shape for every POST and PATCH route of the route table, ids in paths included. */
export const bodyCases = (ctx: FuzzContext): fc.Arbitrary<FuzzCase> =>
  fc.constantFrom(...ctx.writeRoutes).chain((route) => {
    const key = `${route.method} ${route.path}`;
    const own =
      key === 'POST /api/curation/merge'
        ? { survivorId: ctx.recordIds[0], mergedIds: [ctx.recordIds[1]] }
        : key === 'POST /api/bookmarks'
          ? { recordId: ctx.recordIds[0] }
          : {};
    const body = validBodies[key]
      ? wrongShapedBody(key).map((value) =>
          value && typeof value === 'object' && !Array.isArray(value) && Object.keys(own).length > 0
            ? { ...own, ...value }
            : value,
        )
      : wrongShapedBody(key);
    return fc
      .tuple(urlFor(ctx, route), body)
      .map(([url, value]) => jsonCase(key, route.method === 'PATCH' ? 'patch' : 'post', url, value));
  });

/** Bodies that are not JSON, or not what their content type says, or too big or too deep, to write routes. */
export const rawCases = (ctx: FuzzContext): fc.Arbitrary<FuzzCase> =>
  fc
    .tuple(fc.constantFrom(...ctx.writeRoutes), rawBody, fc.constantFrom(...contentTypes))
    .chain(([route, body, type]) =>
      urlFor(ctx, route).map((url): FuzzCase => ({
        endpoint: `${route.method} ${route.path}`,
        input: `${url} (${type}) ${body.length > 120 ? `${body.slice(0, 120)}… (${body.length} chars)` : JSON.stringify(body)}`,
        send: (agent) =>
          write(agent, route.method === 'PATCH' ? 'patch' : 'post', url)
            .set('Content-Type', type)
            .send(body),
      })),
    );

const queryValue = fc.oneof(
  fc.string({ unit: 'binary', maxLength: 30 }),
  fc.constantFrom('', '-1', '0', '1e309', 'NaN', '99999999999', 'true', '[]', '{}', 'x'.repeat(5_000)),
  smilesLike,
);
const queryKeys = [
  'q',
  'mode',
  'structure',
  'page',
  'pageSize',
  'sort',
  'order',
  'view',
  'threshold',
  'limit',
  'class',
  'phase',
  'solvent',
  'stain',
  'outcome',
  'technique',
  'contributor',
  'from',
  'to',
  'size',
  'ids',
];

/** Path parameters with hostile values on GET routes, and query strings of hostile values (repeated keys make arrays). */
export const pathCases = (ctx: FuzzContext): fc.Arbitrary<FuzzCase> =>
  fc.oneof(
    fc
      .constantFrom(...ctx.paramRoutes)
      .chain((route) => urlFor(ctx, route).map((url) => getCase(`GET ${route.path}`, url))),
    fc
      .tuple(
        fc.constantFrom(
          '/api/search',
          '/api/records',
          '/api/compounds',
          '/api/export.csv',
          '/api/curation/merge-preview',
          '/api/photos/' + ctx.photoId,
        ),
        fc.array(fc.tuple(fc.constantFrom(...queryKeys), queryValue), { minLength: 1, maxLength: 5 }),
      )
      .map(([path, pairs]) =>
        getCase(
          `GET ${path.replace(/\d+$/, ':id')}`,
          `${path}?${pairs.map(([key, value]) => `${key}=${uri(value)}`).join('&')}`,
        ),
      ),
  );

/** Every family, with the share of cases it gets in a run. */
export const fuzzFamilies = (ctx: FuzzContext) => ({
  structures: { weight: 30, cases: structureCases(ctx) },
  eluents: { weight: 12, cases: eluentCases(ctx) },
  csv: { weight: 12, cases: csvCases() },
  uploads: { weight: 6, cases: uploadCases(ctx) },
  bodies: { weight: 25, cases: bodyCases(ctx) },
  raw: { weight: 5, cases: rawCases(ctx) },
  paths: { weight: 10, cases: pathCases(ctx) },
});
