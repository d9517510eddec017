import type { RecordDto } from '../../../../shared/schemas/record';
import { formatNumber } from '../../../../shared/domain/format-number';

const rows: { key: keyof NonNullable<RecordDto['column']>; label: string; unit?: string }[] = [
  { key: 'diameterMm', label: 'Column diameter', unit: 'mm' },
  { key: 'cartridgeSize', label: 'Cartridge' },
  { key: 'silicaG', label: 'Silica', unit: 'g' },
  { key: 'sampleMg', label: 'Sample', unit: 'mg' },
  { key: 'loadMethod', label: 'Load' },
  { key: 'fractionMl', label: 'Fraction size', unit: 'mL' },
  { key: 'fractionsPooled', label: 'Fractions pooled' },
  { key: 'yieldPercent', label: 'Yield', unit: '%' },
  { key: 'purityNote', label: 'Purity' },
];

/** Flash-column details with their units; fields not recorded are left out. */
export function ColumnDetailsView({ column }: { column: NonNullable<RecordDto['column']> }) {
  const present = rows.filter((row) => column[row.key] !== null);
  return (
    <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm">
      {present.map((row) => {
        const value = column[row.key];
        return (
          <div key={row.key} className="contents">
            <dt className="text-ink-soft">{row.label}</dt>
            <dd className={typeof value === 'number' ? 'figure' : ''}>
              {typeof value === 'number' ? formatNumber(value, 1) : String(value)}
              {row.unit ? ` ${row.unit}` : ''}
              {row.key === 'loadMethod' ? ' load' : ''}
            </dd>
          </div>
        );
      })}
    </dl>
  );
}
