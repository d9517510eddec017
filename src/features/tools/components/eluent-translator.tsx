import { useDeferredValue, useState } from 'react';
import { Card } from '../../../components/ui/card';
import { TextField } from '../../../components/ui/field';
import { SelectField } from '../../../components/ui/select';
import { HazardLine } from '../../../components/ui/hazard-line';
import { useTranslation } from '../api/translate-eluent';
import { pairPresets } from './translator-presets';
import { TranslationView } from './translation-view';

/** From one eluent to the equal-strength mixture of another pair (Snyder's ε°), hazards of both sides beside it. */
export function EluentTranslator({ initialEluent = 'DCM/MeOH 19:1' }: { initialEluent?: string }) {
  const [eluent, setEluent] = useState(initialEluent);
  const [presetKey, setPresetKey] = useState(pairPresets[1].key);
  const [adsorbent, setAdsorbent] = useState<'silica' | 'alumina'>('silica');
  const deferred = useDeferredValue(eluent.trim());
  const preset = pairPresets.find((item) => item.key === presetKey) ?? pairPresets[0];
  const translation = useTranslation(deferred ? { from: deferred, to: preset.to, adsorbent } : null);
  return (
    <Card title="Eluent translator">
      <div className="grid grid-cols-1 gap-3 sm:grid-cols-3">
        <TextField
          label="From eluent"
          mono
          value={eluent}
          onChange={(event) => setEluent(event.target.value)}
          hint='As written in a notebook, e.g. "EtOAc/hexanes 1:4" or "5% MeOH in DCM".'
        />
        <SelectField
          label="Into the pair"
          value={presetKey}
          onChange={(event) => setPresetKey(event.target.value)}
          options={pairPresets.map((item) => ({ value: item.key, label: item.label }))}
        />
        <SelectField
          label="Adsorbent"
          value={adsorbent}
          onChange={(event) => setAdsorbent(event.target.value as 'silica' | 'alumina')}
          options={[
            { value: 'silica', label: 'silica' },
            { value: 'alumina', label: 'alumina' },
          ]}
        />
      </div>
      <div className="mt-4" aria-live="polite">
        {translation.error && (
          <p role="alert" className="text-sm text-failed">
            {translation.error.message}
          </p>
        )}
        {translation.data && <TranslationView result={translation.data} />}
      </div>
      <div className="mt-3">
        <HazardLine>
          Solvents are flammable and some are toxic or form peroxides; check each one’s hazards below.
        </HazardLine>
      </div>
    </Card>
  );
}
