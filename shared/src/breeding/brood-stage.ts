/** Stages of a brood, in the order they happen. */
export type BroodStage = 'eggs' | 'eggs-with-legs' | 'first-instar' | 'second-instar';

export const BROOD_STAGES: readonly BroodStage[] = ['eggs', 'eggs-with-legs', 'first-instar', 'second-instar'];

export type BroodStageLabels = Readonly<Record<BroodStage, string>>;

/**
 * Instar numbering differs between sources (docs/trade-facts.md §1), so labels are configurable.
 * US-style: "1st instar" is the first free-living nymph.
 */
export const US_BROOD_STAGE_LABELS: BroodStageLabels = Object.freeze({
  eggs: 'Eggs',
  'eggs-with-legs': 'Eggs with legs',
  'first-instar': '1st instar',
  'second-instar': '2nd instar',
});

/** German-style: Eier → Prälarve ("Eier mit Beinen") → N1 → N2 (the larval stage in the sac is not tracked). */
export const GERMAN_BROOD_STAGE_LABELS: BroodStageLabels = Object.freeze({
  eggs: 'Eier',
  'eggs-with-legs': 'Prälarve (Eier mit Beinen)',
  'first-instar': 'N1',
  'second-instar': 'N2',
});

export const BROOD_STAGE_LABEL_SETS = Object.freeze({ us: US_BROOD_STAGE_LABELS, de: GERMAN_BROOD_STAGE_LABELS });
export type BroodStageLabelSet = keyof typeof BROOD_STAGE_LABEL_SETS;

export function isBroodStage(value: unknown): value is BroodStage {
  return typeof value === 'string' && (BROOD_STAGES as readonly string[]).includes(value);
}

/** Position in the order (eggs = 0). */
export function broodStageIndex(stage: BroodStage): number {
  const i = BROOD_STAGES.indexOf(stage);
  if (i < 0) throw new RangeError(`"${String(stage)}" is not a brood stage (one of ${BROOD_STAGES.join(', ')}).`);
  return i;
}

/** Negative when `a` comes before `b`, 0 when equal; usable with Array.prototype.sort. */
export function compareBroodStages(a: BroodStage, b: BroodStage): number {
  return broodStageIndex(a) - broodStageIndex(b);
}

/** True when `stage` is `target` or later. */
export function isBroodStageAtLeast(stage: BroodStage, target: BroodStage): boolean {
  return compareBroodStages(stage, target) >= 0;
}

export function broodStageLabel(stage: BroodStage, labels: BroodStageLabels = US_BROOD_STAGE_LABELS): string {
  broodStageIndex(stage);
  return labels[stage];
}
