import type { ColumnPlanResult } from '../../../../shared/schemas/tools';

/** The sizing table of Still, Kahn & Mitra (1978), the row the plan used highlighted. */
export function StillTableView({ table, highlight }: { table: ColumnPlanResult['table']; highlight: number | null }) {
  return (
    <table className="mt-2 w-full text-sm">
      <caption className="pb-1 text-left text-xs text-ink-soft">
        {table.source}; bed about 15 cm of 40–63 µm silica.
      </caption>
      <thead>
        <tr className="border-b border-line text-left text-xs text-ink-soft">
          <th scope="col" className="py-1 pr-3 font-medium">
            Diameter (mm)
          </th>
          <th scope="col" className="py-1 pr-3 font-medium">
            Eluent (mL)
          </th>
          <th scope="col" className="py-1 pr-3 font-medium">
            Load, ΔRf ≥ 0.2 (mg)
          </th>
          <th scope="col" className="py-1 pr-3 font-medium">
            Load, ΔRf ≥ 0.1 (mg)
          </th>
          <th scope="col" className="py-1 font-medium">
            Fraction (mL)
          </th>
        </tr>
      </thead>
      <tbody className="figure">
        {table.rows.map((row) => (
          <tr
            key={row.diameterMm}
            className={`border-b border-line/60 ${row.diameterMm === highlight ? 'bg-spot-light' : ''}`}
            aria-current={row.diameterMm === highlight ? 'true' : undefined}
          >
            <td className="py-1 pr-3">{row.diameterMm}</td>
            <td className="py-1 pr-3">{row.eluentMl}</td>
            <td className="py-1 pr-3">{row.loadMgAtDeltaRf02}</td>
            <td className="py-1 pr-3">{row.loadMgAtDeltaRf01}</td>
            <td className="py-1">{row.fractionMl}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
