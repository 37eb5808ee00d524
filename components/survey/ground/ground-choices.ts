import { GROUND_CLASSES, isGroundClassName, type GroundClassName } from '../../../shared/ground';
import { siteFieldsSchema } from '../../../shared/schemas';
import { parseDecimal } from '../forms/parse-decimal';

/*
 * What a scout can see and feel underfoot, in plain words, mapped to the ground classes the physics uses
 * (shared/ground). The mapping is Loftline's judgement from the class descriptions of the amateur ground
 * table (ARRL Antenna Book, "very good: pastoral, rich soil", "poor: rocky, steep hills", …) and the ITU-R
 * P.527 categories; where a choice has no exact class the reason says which way we erred.
 */

export type GroundChoiceId =
  | 'wet-meadow' | 'ordinary-lawn' | 'forest-floor' | 'dry-sandy' | 'rocky-hillside' | 'parched-hard'
  | 'salt-marsh' | 'over-sea' | 'near-fresh-water' | 'town-paved' | 'not-sure';

export type GroundChoice = { id: GroundChoiceId; label: string; hint: string; classId: GroundClassName; reason: string };

export const GROUND_CHOICES: readonly GroundChoice[] = [
  { id: 'wet-meadow', label: 'Wet meadow or rich pasture', hint: 'Green, soft underfoot, dark soil', classId: 'very-good',
    reason: 'Moist rich soil conducts well: the amateur table’s “very good” class (pastoral, rich soil).' },
  { id: 'ordinary-lawn', label: 'Ordinary park lawn or farmland', hint: 'Firm grass, soil neither soaked nor dusty', classId: 'average',
    reason: 'Everyday soil: the amateur table’s “average” class.' },
  { id: 'forest-floor', label: 'Woodland or heavy clay', hint: 'Leaf litter, clay that sticks to boots', classId: 'average',
    reason: 'The amateur table puts forest and heavy clay in its “average” class.' },
  { id: 'dry-sandy', label: 'Dry sand or sandy coast', hint: 'Sand runs through the fingers', classId: 'sandy-dry',
    reason: 'Dry sand conducts poorly: the amateur table’s “sandy, dry, coastal” class.' },
  { id: 'rocky-hillside', label: 'Rocky hillside, thin soil over rock', hint: 'Stones everywhere, stakes hit rock', classId: 'poor',
    reason: 'Rock and steep hills: the amateur table’s “poor” class.' },
  { id: 'parched-hard', label: 'Parched, hard-baked ground', hint: 'Cracked surface after a long dry spell', classId: 'medium-dry-ground',
    reason: 'Dry ground: the ITU-R P.527 “medium dry ground” category (values read from memory of its figure).' },
  { id: 'salt-marsh', label: 'Salt marsh or tidal flat', hint: 'Mud soaked with sea water', classId: 'very-good',
    reason: 'Soaked with sea water it conducts better than any farmland; Loftline takes “very good” so as not to overstate it. Use the expert values if you know them.' },
  { id: 'over-sea', label: 'On the shore, wires over sea water', hint: 'The antenna hangs over the sea itself', classId: 'salt-water',
    reason: 'Sea water is close to a perfect ground: the amateur table’s “salt water” class.' },
  { id: 'near-fresh-water', label: 'Beside a lake or river', hint: 'The wires run out over fresh water', classId: 'fresh-water',
    reason: 'Fresh water conducts little but reflects strongly (εr 80): the amateur table’s “fresh water” class.' },
  { id: 'town-paved', label: 'Town park among buildings, paved ground', hint: 'Asphalt, buildings and buried pipes', classId: 'very-poor',
    reason: 'Cities and industrial ground: the amateur table’s “very poor” class.' },
  { id: 'not-sure', label: 'Not sure', hint: 'Loftline plans with the middle class', classId: 'average',
    reason: 'When nobody could tell, the middle “average” class is planned; change it when you know more.' },
];

export function groundChoice(id: GroundChoiceId): GroundChoice {
  const found = GROUND_CHOICES.find((c) => c.id === id);
  if (!found) throw new Error(`unknown ground choice "${id}"`);
  return found;
}

/** σ and εr of a class, to show beside the choice ("σ 0.005 S/m, εr 13"). */
export function classConstants(classId: GroundClassName): { sigmaSPerM: number; epsR: number; source: string } | null {
  const c = GROUND_CLASSES[classId];
  return c.kind === 'real' ? { sigmaSPerM: c.sigmaSPerM, epsR: c.epsR, source: c.source } : null;
}

export type GroundFields = { groundDescription: string; groundClass: string | null; groundSigmaSPerM: number | null; groundEpsR: number | null };

const groundFieldsSchema = siteFieldsSchema.pick({ groundDescription: true, groundClass: true, groundSigmaSPerM: true, groundEpsR: true });

/** The site fields for a plain-words choice, plus the scout's own words if any. */
export function fieldsForChoice(id: GroundChoiceId, ownWords = ''): GroundFields {
  const c = groundChoice(id);
  const words = ownWords.trim();
  return { groundDescription: words ? `${c.label}: ${words}` : c.label, groundClass: c.classId, groundSigmaSPerM: null, groundEpsR: null };
}

export type ExpertInput = { sigmaText: string; epsRText: string; ownWords: string };
export type ExpertResult = { ok: true; fields: GroundFields } | { ok: false; errors: { sigma?: string; epsR?: string } };

/** The expert override: measured σ and εr typed in, checked against the site record's schema limits. */
export function fieldsForExpert(input: ExpertInput): ExpertResult {
  const sigma = parseDecimal(input.sigmaText);
  const epsR = parseDecimal(input.epsRText);
  const errors: { sigma?: string; epsR?: string } = {};
  if (sigma === null) errors.sigma = 'Type the conductivity in S/m, for example 0.005';
  if (epsR === null) errors.epsR = 'Type the relative permittivity, for example 13';
  if (sigma !== null && epsR !== null) {
    const parsed = groundFieldsSchema.safeParse({ groundDescription: input.ownWords || 'Measured by hand', groundClass: null, groundSigmaSPerM: sigma, groundEpsR: epsR });
    if (parsed.success) return { ok: true, fields: parsed.data };
    for (const issue of parsed.error.issues) {
      if (issue.path[0] === 'groundSigmaSPerM') errors.sigma = issue.message;
      else if (issue.path[0] === 'groundEpsR') errors.epsR = issue.message;
    }
  }
  return { ok: false, errors };
}

/** Which choice a stored site shows as picked: by its description's label, else none (expert or custom). */
export function choiceOfSite(site: GroundFields): GroundChoiceId | 'expert' | null {
  if (site.groundClass === null && site.groundSigmaSPerM !== null) return 'expert';
  const byLabel = GROUND_CHOICES.find((c) => site.groundDescription === c.label || site.groundDescription.startsWith(`${c.label}: `));
  if (byLabel && byLabel.classId === site.groundClass) return byLabel.id;
  if (site.groundClass && isGroundClassName(site.groundClass)) {
    return GROUND_CHOICES.find((c) => c.classId === site.groundClass)?.id ?? null;
  }
  return null;
}
