import type { RecordInputParsed } from '../../../shared/schemas/record';
import { cleanMessage, StructureError } from '../../chem/errors';
import { analyseStructure, type StructureAnalysis } from '../../core/compound-analysis';
import { recordContentHash, type RecordContent } from '../../core/record-columns';
import { MappedRow, readRow, type ImportFormat } from './read-row';
import type { SourceRow } from './source';
import { validateRow } from './validate-row';
import type { RowContext, RowFacts } from './row-facts';

/** A row read, validated and its structure analysed, before the batch decides whether it is new. */
export type PreparedRow =
  | {
      source: SourceRow;
      ok: true;
      record: RecordInputParsed & { structure: string };
      analysis: StructureAnalysis;
      notes: string[];
      warnings: string[];
      facts: RowFacts;
    }
  | { source: SourceRow; ok: false; reason: string; notes: string[] };

/**
 * Analyses each distinct structure text once per import (a group's history repeats compounds), keeping
 * the chemistry engine's refusal for texts it rejects.
 */
export class StructureCache {
  private readonly known = new Map<string, StructureAnalysis | Error>();

  analyse(text: string): StructureAnalysis | Error {
    let found = this.known.get(text);
    if (!found) {
      try {
        found = analyseStructure(text, { depict: false });
      } catch (error) {
        found =
          error instanceof StructureError
            ? error
            : new Error(`The structure could not be read: ${cleanMessage(error)}.`);
      }
      this.known.set(text, found);
    }
    return found;
  }
}

/**
 * Reads, validates (as a contributed record would be) and analyses one row. Every problem found is listed
 * in the reason, the structure's included, so one round of fixes is enough.
 */
export function prepareRow(
  source: SourceRow,
  mapping: Record<string, string>,
  format: ImportFormat,
  structures: StructureCache,
  context?: RowContext,
): PreparedRow {
  const row = new MappedRow(source, mapping);
  const reading = readRow(source, mapping, format, context);
  const validation = reading.ok ? validateRow(reading.input, row) : null;
  const text = row.structure();
  const analysis = text ? structures.analyse(text) : null;
  const problems = [
    reading.ok ? null : reading.reason,
    validation && !validation.ok ? validation.reason : null,
    analysis instanceof Error ? `Bad structure (column "${row.header('structure')}"): ${analysis.message}` : null,
  ].filter((problem): problem is string => problem !== null);
  const notes = reading.ok ? reading.notes : [];
  if (problems.length > 0 || !validation?.ok || !analysis || analysis instanceof Error) {
    return { source, ok: false, reason: [...new Set(problems)].join(' '), notes };
  }
  if (!reading.ok) return { source, ok: false, reason: 'The row could not be read.', notes };
  const warnings = [...reading.warnings, ...validation.warnings];
  return {
    source,
    ok: true,
    record: { ...validation.record, structure: text },
    analysis,
    notes,
    warnings,
    facts: reading.facts,
  };
}

export type AcceptedRow = Extract<PreparedRow, { ok: true }>;

/** The record content of an accepted row once its compound is known. */
export function contentOf(row: AcceptedRow, compoundId: number): RecordContent {
  const { structure: _structure, compoundId: _compoundId, name: _name, ...fields } = row.record;
  return { ...fields, compoundId };
}

/**
 * The content hashes under which a row counts as already stored: its own, and the one of the same row with
 * a TLC plate written as column silica (records stored before TLC rows got the TLC plate), so a re-imported
 * export of older records adds nothing.
 */
export function contentHashes(row: AcceptedRow, compoundId: number): string[] {
  const content = contentOf(row, compoundId);
  const own = recordContentHash(content);
  if (content.technique === 'flash' || content.stationaryPhase !== 'silica-tlc-f254') return [own];
  return [own, recordContentHash({ ...content, stationaryPhase: 'silica-gel' })];
}
