import { solventByKey } from './solvents';
import { stainByKey } from './stains';
import type { SolventHazard } from './types';

export interface Caution {
  key: string;
  title: string;
  text: string;
}

/** Appended to every caution: the user's own safety sources decide, not this page. */
export const deferToSafetyOffice =
  'Follow the safety data sheets, your local rules and your institution’s safety office; they take precedence over this note.';

const caution = (key: string, title: string, body: string): Caution => ({
  key,
  title,
  text: `${body} ${deferToSafetyOffice}`,
});

/** The usual cautions of the trade (common practice), each deferring to local safety sources. */
export const cautions = {
  flammableSolvent: caution(
    'flammable-solvent',
    'Flammable solvents',
    'Keep eluents away from hot plates, heat guns and sparks; work in a fume hood and keep volumes on the bench small.',
  ),
  peroxideFormer: caution(
    'peroxide-former',
    'Peroxide-forming solvents',
    'Date containers on opening, test for peroxides before use and never distil or evaporate to dryness without testing.',
  ),
  toxicSolvent: caution(
    'toxic-solvent',
    'Toxic or suspected carcinogenic solvents',
    'Handle only in a fume hood with suitable gloves; choose a greener alternative where one works.',
  ),
  pressurisedGlass: caution(
    'pressurised-glass',
    'Pressurised glass columns',
    'Use columns rated for pressure, check the glass for cracks and stars, keep pressure low (a few ' +
      'tenths of a bar), use a safety screen and never clamp the outlet shut under pressure.',
  ),
  silicaDust: caution(
    'silica-dust',
    'Silica dust',
    'Fine silica harms the lungs: weigh and pour it in a fume hood, avoid raising dust and dispose of ' +
      'used silica as solvent-contaminated waste.',
  ),
  uvLamp: caution(
    'uv-lamp',
    'UV lamps',
    'Never look into a UV lamp; use the shield and UV-blocking glasses and keep skin exposure short.',
  ),
  stainsAndHeat: caution(
    'stains-and-heat',
    'Stains and heat guns',
    'Many stains are corrosive or oxidising (acid, permanganate, molybdates); dip in a fume hood, wear ' +
      'gloves and eye protection, and keep the heat gun away from solvent vapour.',
  ),
} as const;

const toxicHazards: readonly SolventHazard[] = [
  'toxic',
  'carcinogen',
  'carcinogen-suspect',
  'reproductive-toxicant-suspect',
  'neurotoxic',
];
const flammableHazards: readonly SolventHazard[] = ['extremely-flammable', 'highly-flammable', 'flammable'];

export interface CautionContext {
  solventKeys?: readonly string[];
  stainKeys?: readonly string[];
  /** True when a glass flash column is run under pressure. */
  flashColumn?: boolean;
  /** True when silica is weighed or packed by hand. */
  handlesSilica?: boolean;
}

/** The cautions that apply to a set of conditions, in a stable order, without repeats. */
export function cautionsFor(context: CautionContext): Caution[] {
  const hazards = new Set((context.solventKeys ?? []).flatMap((key) => solventByKey(key)?.hazards ?? []));
  const stainList = (context.stainKeys ?? []).map((key) => stainByKey(key)).filter((stain) => stain !== undefined);
  const picked: Caution[] = [];
  if (flammableHazards.some((hazard) => hazards.has(hazard))) picked.push(cautions.flammableSolvent);
  if (hazards.has('peroxide-former')) picked.push(cautions.peroxideFormer);
  if (toxicHazards.some((hazard) => hazards.has(hazard))) picked.push(cautions.toxicSolvent);
  if (context.flashColumn) picked.push(cautions.pressurisedGlass);
  if (context.flashColumn || context.handlesSilica) picked.push(cautions.silicaDust);
  if (stainList.some((stain) => stain.nonDestructive)) picked.push(cautions.uvLamp);
  if (stainList.some((stain) => !stain.nonDestructive)) picked.push(cautions.stainsAndHeat);
  return picked;
}
