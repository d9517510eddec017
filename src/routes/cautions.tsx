import { cautions, deferToSafetyOffice } from '../../shared/catalogue/cautions';
import { solvents } from '../../shared/catalogue/solvents';
import { stains } from '../../shared/catalogue/stains';
import { Card } from '../components/ui/card';

const words = (hazards: readonly string[]) => hazards.map((hazard) => hazard.replace(/-/g, ' ')).join(', ');

/** The usual cautions of TLC and flash chromatography, deferring to SDS, local rules and the safety office. */
export default function CautionsPage() {
  return (
    <section className="space-y-4">
      <header className="space-y-1">
        <h1 className="text-2xl font-semibold">Lab cautions</h1>
        <p className="max-w-3xl text-sm text-ink-soft">
          Reminders of common practice, not a risk assessment. {deferToSafetyOffice}
        </p>
      </header>
      <div className="grid grid-cols-1 gap-4 md:grid-cols-2">
        {Object.values(cautions).map((caution) => (
          <Card key={caution.key} title={caution.title}>
            <p className="text-sm">{caution.text}</p>
          </Card>
        ))}
      </div>
      <Card title="Solvents">
        <table className="w-full text-sm">
          <thead>
            <tr className="border-b border-line text-left text-xs text-ink-soft">
              <th scope="col" className="py-1 pr-3 font-medium">
                Solvent
              </th>
              <th scope="col" className="py-1 pr-3 font-medium">
                Hazards
              </th>
              <th scope="col" className="py-1 font-medium">
                Greener alternative (common practice)
              </th>
            </tr>
          </thead>
          <tbody>
            {solvents.map((solvent) => (
              <tr key={solvent.key} className="border-b border-line/60 align-top">
                <th scope="row" className="py-1.5 pr-3 text-left font-medium">
                  {solvent.name}
                </th>
                <td className="py-1.5 pr-3">
                  {words(solvent.hazards) || '—'}
                  <p className="text-xs text-ink-soft">{solvent.hazardNote}</p>
                </td>
                <td className="py-1.5 text-xs">
                  {solvent.greenerAlternatives.map((alternative) => alternative.note).join(' ') || '—'}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </Card>
      <Card title="Stains and visualisation">
        <ul className="space-y-1 text-sm">
          {stains.map((stain) => (
            <li key={stain.key}>
              <strong>{stain.name}</strong>
              {stain.needsHeat ? ' (heat gun)' : ''}: {stain.preparationHazards}
            </li>
          ))}
        </ul>
      </Card>
    </section>
  );
}
