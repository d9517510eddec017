import type { InferAttributes } from 'sequelize';
import type {
  Compound,
  ConditionRecord,
  RecordContributor,
  RecordPhoto,
  RecordSpot,
  RecordVisualisation,
  User,
} from '../db/models';
import type { RecordDto, RecordListItem, PhotoDto } from '../../shared/schemas/record';
import { stationaryPhaseByKey } from '../../shared/catalogue/stationary-phases';
import { stainByKey } from '../../shared/catalogue/stains';
import { eluentSummary } from '../../shared/domain/eluent-summary';
import { columnOf } from './record-revisions';

type Person = Pick<User, 'id' | 'name'>;

/** A record row (plain values) with the associations the presenters read (loaded by core/record-queries). */
export type LoadedRecord = InferAttributes<ConditionRecord> & {
  compound: Omit<InferAttributes<Compound>, 'fingerprint' | 'molfile'>;
  author: Person;
  spots: InferAttributes<RecordSpot>[];
  visualisations: InferAttributes<RecordVisualisation>[];
};

/** A record as the exports read it: with its compound's molfile. */
export type ExportRecord = LoadedRecord & { compound: { molfile: string } };

type PhotoRow = InferAttributes<RecordPhoto> & { uploader?: Person };

export type FullRecord = LoadedRecord & {
  photos: PhotoRow[];
  contributors: (InferAttributes<RecordContributor> & { user: Person })[];
};

const iso = (date: Date | null) => (date ? new Date(date).toISOString() : null);

export function phaseLabel(key: string, other: string | null): string {
  if (key === 'other') return other ?? 'other';
  return stationaryPhaseByKey(key)?.name ?? key;
}

export function visualisationLabel(method: string, note: string | null): string {
  if (method === 'other') return note ?? 'other';
  return stainByKey(method)?.label ?? method;
}

export function presentPhoto(photo: PhotoRow, uploaderName = photo.uploader?.name ?? 'unknown'): PhotoDto {
  return {
    id: photo.id,
    contentType: photo.contentType,
    byteSize: photo.byteSize,
    width: photo.width,
    height: photo.height,
    url: `/api/photos/${photo.id}`,
    thumbUrl: `/api/photos/${photo.id}?size=thumb`,
    caption: photo.caption,
    uploadedBy: { id: photo.uploadedBy, name: uploaderName },
    createdAt: photo.createdAt.toISOString(),
  };
}

/** One row of the records table. */
export function presentRecordListItem(record: LoadedRecord, photoCount: number): RecordListItem {
  const byPosition = <T extends { position: number; id: number }>(rows: T[]) =>
    [...rows].sort((a, b) => a.position - b.position || a.id - b.id);
  return {
    id: record.id,
    status: record.status,
    compound: {
      id: record.compound.id,
      name: record.compound.name,
      canonicalSmiles: record.compound.canonicalSmiles,
      formula: record.compound.formula,
      mw: record.compound.mw,
      classes: record.compound.classes,
    },
    author: { id: record.author.id, name: record.author.name },
    technique: record.technique,
    stationaryPhase: record.stationaryPhase,
    stationaryPhaseLabel: phaseLabel(record.stationaryPhase, record.stationaryPhaseOther),
    eluent: record.eluent,
    eluentSummary: eluentSummary(record.eluent, record.stationaryPhase),
    spots: byPosition(record.spots).map(({ id, role, rf, lane, spotDistanceMm, frontDistanceMm, label }) => ({
      id,
      role,
      rf,
      lane,
      spotDistanceMm,
      frontDistanceMm,
      label,
    })),
    targetRf: record.targetRf,
    visualisations: byPosition(record.visualisations).map(({ method, note }) => ({
      method,
      note,
      label: visualisationLabel(method, note),
    })),
    outcome: record.outcome,
    yieldPercent: record.yieldPercent,
    notebookRef: record.notebookRef,
    runOn: record.runOn ?? null,
    photoCount,
    demo: record.demo,
    createdAt: record.createdAt.toISOString(),
    updatedAt: record.updatedAt.toISOString(),
  };
}

/** A record with every field; `canEdit` answers for the user asking. */
export function presentRecord(record: FullRecord, canEdit: boolean): RecordDto {
  const photos = record.photos.filter((photo) => !photo.removedAt).sort((a, b) => a.id - b.id);
  const contributors = record.contributors
    .sort((a, b) => a.id - b.id)
    .map((row) => ({ id: row.userId, name: row.user.name, role: row.role }));
  return {
    ...presentRecordListItem(record, photos.length),
    stationaryPhaseOther: record.stationaryPhaseOther,
    outcomeReason: record.outcomeReason,
    column: columnOf(record) as RecordDto['column'],
    notes: record.notes,
    photos: photos.map((photo) => presentPhoto(photo)),
    contributors: contributors.filter(
      (person, index) =>
        contributors.findIndex((other) => other.id === person.id && other.role === person.role) === index,
    ),
    mergedIntoId: record.mergedIntoId,
    retiredReason: record.retiredReason,
    retiredAt: iso(record.retiredAt),
    importId: record.importId,
    recordedBy: record.recordedBy ?? null,
    sourceTexts: record.sourceTexts ?? null,
    revision: record.revision,
    canEdit,
  };
}
