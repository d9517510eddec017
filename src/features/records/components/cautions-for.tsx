import { useFormContext, useWatch } from 'react-hook-form';
import { cautionsFor } from '../../../../shared/catalogue/cautions';
import { HazardLine } from '../../../components/ui/hazard-line';
import type { RecordFormValues } from './record-form-values';

/** The usual cautions for the conditions being entered (solvents, stains, a pressurised column), quietly. */
export function CautionsFor() {
  const { control } = useFormContext<RecordFormValues>();
  const [components, visualisation, technique] = useWatch({
    control,
    name: ['eluent.components', 'visualisation', 'technique'],
  });
  const found = cautionsFor({
    solventKeys: components.map((part) => part.solvent),
    stainKeys: visualisation,
    flashColumn: technique === 'flash',
  });
  if (found.length === 0) return null;
  return <HazardLine>{found.map((caution) => caution.title).join(' · ')}.</HazardLine>;
}
