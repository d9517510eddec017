import { Router } from 'express';
import { allow } from '../../http/middleware/access';
import { handle } from '../../http/middleware/validate';
import { structureParseInputSchema, type StructureParseResult } from '../../../shared/schemas/compound';
import { analyseStructure, descriptorsOf } from '../../core/compound-analysis';
import { Compound } from '../../db/models';

export const structuresRouter = Router();

/**
 * Parses SMILES or molfile and answers identity, descriptors, classes and a depiction; bad input → 400/413/422 from
 * the chemistry engine.
 */
structuresRouter.post(
  '/parse',
  allow('viewer'),
  handle({ body: structureParseInputSchema }, async ({ body }, _req, res) => {
    const analysis = analyseStructure(body.structure);
    const existing = await Compound.findOne({ where: { idcode: analysis.idcode }, attributes: ['id'] });
    const result: StructureParseResult = {
      canonicalSmiles: analysis.canonicalSmiles,
      molfile: analysis.molfile,
      ...descriptorsOf(analysis),
      classes: analysis.classes,
      svg: analysis.svg,
      name: analysis.name,
      isSalt: analysis.isSalt,
      isMixture: analysis.isMixture,
      existingCompoundId: existing?.id ?? null,
    };
    res.json(result);
  }),
);
