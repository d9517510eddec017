import { Link } from 'react-router-dom';
import type { ClassIndexItem } from '../../../../shared/schemas/classes';
import { OutcomeBar } from './outcome-bar';

/** The class index: every class, how many compounds and records the group has of it, and how they went. */
export function ClassTable({ classes }: { classes: ClassIndexItem[] }) {
  return (
    <div className="overflow-x-auto rounded-plate border border-line bg-surface">
      <table className="w-full text-sm">
        <thead className="border-b border-line bg-plate text-left text-xs text-ink-soft">
          <tr>
            <th scope="col" className="px-3 py-2 font-medium">
              Class
            </th>
            <th scope="col" className="px-3 py-2 text-right font-medium">
              Compounds
            </th>
            <th scope="col" className="px-3 py-2 text-right font-medium">
              Records
            </th>
            <th scope="col" className="px-3 py-2 font-medium">
              Outcomes (clean/partial/failed)
            </th>
          </tr>
        </thead>
        <tbody>
          {classes.map((item) => (
            <tr key={item.key} className="border-b border-line/70 last:border-0 hover:bg-plate/60">
              <td className="px-3 py-2">
                <Link
                  to={`/classes/${item.key}`}
                  className="inline-block min-h-6 py-0.5 font-medium text-front hover:underline"
                >
                  {item.name}
                </Link>
                <p className="text-xs text-ink-soft">{item.description}</p>
              </td>
              <td className="figure px-3 py-2 text-right">{item.compoundCount}</td>
              <td className="figure px-3 py-2 text-right">{item.recordCount}</td>
              <td className="px-3 py-2">
                {item.recordCount > 0 ? (
                  <OutcomeBar outcomes={item.outcomes} />
                ) : (
                  <span className="text-xs text-ink-soft">no records yet</span>
                )}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
