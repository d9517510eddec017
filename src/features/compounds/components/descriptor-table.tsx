import type { CompoundDetail } from '../../../../shared/schemas/compound';
import { formatNumber } from '../../../../shared/domain/format-number';

const rows: { key: keyof CompoundDetail['descriptors']; label: string; unit?: string; digits?: number }[] = [
  { key: 'formula', label: 'Formula' },
  { key: 'mw', label: 'Molecular weight', unit: 'g/mol', digits: 2 },
  { key: 'exactMass', label: 'Exact mass', unit: 'Da', digits: 4 },
  { key: 'clogp', label: 'cLogP', digits: 2 },
  { key: 'tpsa', label: 'TPSA', unit: 'Å²', digits: 1 },
  { key: 'hbd', label: 'H-bond donors' },
  { key: 'hba', label: 'H-bond acceptors' },
  { key: 'rotatableBonds', label: 'Rotatable bonds' },
  { key: 'aromaticRings', label: 'Aromatic rings' },
  { key: 'stereocentres', label: 'Stereocentres' },
  { key: 'charge', label: 'Net charge' },
];

/** Descriptors computed with OpenChemLib on the neutral parent; the caption says so. */
export function DescriptorTable({ descriptors }: { descriptors: CompoundDetail['descriptors'] }) {
  return (
    <table className="text-sm">
      <caption className="pb-1 text-left text-xs text-ink-soft">
        Computed with OpenChemLib on the neutral parent structure.
      </caption>
      <tbody>
        {rows.map((row) => {
          const value = descriptors[row.key];
          return (
            <tr key={row.key}>
              <th scope="row" className="pr-4 text-left font-normal text-ink-soft">
                {row.label}
              </th>
              <td className="figure">
                {typeof value === 'number'
                  ? row.key === 'mw'
                    ? value.toFixed(2)
                    : formatNumber(value, row.digits ?? 0)
                  : value}
                {row.unit ? ` ${row.unit}` : ''}
              </td>
            </tr>
          );
        })}
      </tbody>
    </table>
  );
}
