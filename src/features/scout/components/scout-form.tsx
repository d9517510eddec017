import { useId, useState, type FormEvent } from 'react';
import { StructureInput } from '../../../components/structure-input';
import { Button } from '../../../components/ui/button';
import { SelectField } from '../../../components/ui/select';
import { scoutTargetRange, type ScoutInput } from '../../../../shared/schemas/scout';

/** Pairs a chemist may prefer (weak, strong), by catalogue key; "" lets Scout choose. */
const pairOptions = [
  { value: '', label: 'Let Scout choose' },
  { value: 'hexanes|ethyl-acetate', label: 'EtOAc / hexanes' },
  { value: 'heptane|ethyl-acetate', label: 'EtOAc / heptane' },
  { value: 'petroleum-ether|ethyl-acetate', label: 'EtOAc / pet. ether' },
  { value: 'hexanes|diethyl-ether', label: 'Et2O / hexanes' },
  { value: 'pentane|diethyl-ether', label: 'Et2O / pentane' },
  { value: 'hexanes|acetone', label: 'acetone / hexanes' },
  { value: 'dichloromethane|methanol', label: 'MeOH / DCM' },
  { value: 'ethyl-acetate|methanol', label: 'MeOH / EtOAc' },
];
const phaseOptions = [
  { value: '', label: 'Let Scout choose (silica gel unless neighbours say otherwise)' },
  { value: 'silica-gel', label: 'silica gel' },
  { value: 'alumina-neutral', label: 'alumina, neutral' },
  { value: 'alumina-basic', label: 'alumina, basic' },
];

/** Structure, target Rf (0.15–0.45), preferred pair and phase; submits one Scout question. */
export function ScoutForm({
  onSubmit,
  busy,
  initialStructure = '',
}: {
  onSubmit: (input: ScoutInput) => void;
  busy: boolean;
  initialStructure?: string;
}) {
  const id = useId();
  const [structure, setStructure] = useState(initialStructure);
  const [targetRf, setTargetRf] = useState(0.3);
  const [pair, setPair] = useState('');
  const [phase, setPhase] = useState('');
  const [error, setError] = useState<string | undefined>();
  function submit(event: FormEvent) {
    event.preventDefault();
    if (!structure.trim()) {
      setError('Draw or paste a structure first.');
      return;
    }
    setError(undefined);
    const [weak, strong] = pair ? pair.split('|') : [];
    onSubmit({ structure, targetRf, ...(pair ? { solventPair: { weak, strong } } : {}), ...(phase ? { phase } : {}) });
  }
  return (
    <form onSubmit={submit} className="space-y-4" aria-label="Scout question">
      <StructureInput
        value={structure}
        onChange={(text) => setStructure(text)}
        label="Molecule"
        required
        error={error}
        defaultMode="paste"
      />
      <div className="grid gap-4 md:grid-cols-3">
        <div>
          <label htmlFor={`${id}-rf`} className="block text-sm font-medium text-ink">
            Target Rf <span className="figure">{targetRf.toFixed(2)}</span>
          </label>
          <input
            id={`${id}-rf`}
            type="range"
            min={scoutTargetRange[0]}
            max={scoutTargetRange[1]}
            step={0.01}
            value={targetRf}
            onChange={(event) => setTargetRf(Number(event.target.value))}
            className="mt-3 w-full accent-front"
            aria-describedby={`${id}-rf-hint`}
          />
          <p id={`${id}-rf-hint`} className="mt-1 text-xs text-ink-soft">
            Flash columns run best with the target at Rf 0.2–0.35 (Still 1978).
          </p>
        </div>
        <SelectField
          label="Preferred solvent pair"
          value={pair}
          onChange={(event) => setPair(event.target.value)}
          options={pairOptions}
        />
        <SelectField
          label="Stationary phase"
          value={phase}
          onChange={(event) => setPhase(event.target.value)}
          options={phaseOptions}
        />
      </div>
      <Button type="submit" variant="primary" disabled={busy}>
        {busy ? 'Scouting…' : 'Scout conditions'}
      </Button>
    </form>
  );
}
