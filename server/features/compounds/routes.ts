import { Router } from 'express';
import { createHash } from 'node:crypto';
import { allow } from '../../http/middleware/access';
import { handle } from '../../http/middleware/validate';
import { idParamSchema } from '../../../shared/schemas/common';
import { compoundListQuerySchema, type CompoundDetail } from '../../../shared/schemas/compound';
import { activeRecordIdsOf, findCompound, listCompounds } from './queries';
import { loadListRecords } from '../../core/record-queries';
import { presentRecordListItem } from '../../core/record-presenter';
import { compoundSvg } from './depiction';

export const compoundsRouter = Router();

compoundsRouter.get(
  '/',
  allow('viewer'),
  handle({ query: compoundListQuerySchema }, async ({ query }, _req, res) => {
    res.json(await listCompounds(query));
  }),
);

compoundsRouter.get(
  '/:id',
  allow('viewer'),
  handle({ params: idParamSchema }, async ({ params }, _req, res) => {
    const compound = await findCompound(params.id);
    const { records, photoCounts } = await loadListRecords(await activeRecordIdsOf(compound.id));
    const detail: CompoundDetail = {
      id: compound.id,
      name: compound.name,
      synonyms: compound.synonyms,
      canonicalSmiles: compound.canonicalSmiles,
      formula: compound.formula,
      mw: compound.mw,
      classes: compound.classes,
      recordCount: records.length,
      createdAt: compound.createdAt.toISOString(),
      descriptors: {
        formula: compound.formula,
        mw: compound.mw,
        exactMass: compound.exactMass,
        clogp: compound.clogp,
        tpsa: compound.tpsa,
        hbd: compound.hbd,
        hba: compound.hba,
        rotatableBonds: compound.rotatableBonds,
        aromaticRings: compound.aromaticRings,
        stereocentres: compound.stereocentres,
        charge: compound.charge,
      },
      molfile: compound.molfile,
      svgUrl: `/api/compounds/${compound.id}/svg`,
      records: records.map((record) => presentRecordListItem(record, photoCounts.get(record.id) ?? 0)),
    };
    res.json(detail);
  }),
);

/** The depiction; it changes only if the stored structure does, so the ETag is the digest of the SVG. */
compoundsRouter.get(
  '/:id/svg',
  allow('viewer'),
  handle({ params: idParamSchema }, async ({ params }, req, res) => {
    const svg = compoundSvg(await findCompound(params.id));
    const etag = `"${createHash('sha256').update(svg).digest('hex').slice(0, 32)}"`;
    res.set({ ETag: etag, 'Cache-Control': 'private, max-age=3600', 'X-Content-Type-Options': 'nosniff' });
    if (req.headers['if-none-match'] === etag) {
      res.status(304).end();
      return;
    }
    res.type('image/svg+xml').send(svg);
  }),
);
