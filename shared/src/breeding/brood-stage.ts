import type { Words } from '../i18n/words.js';

/** Stages of a brood, in the order they happen. */
export type BroodStage = 'eggs' | 'eggs-with-legs' | 'first-instar' | 'second-instar';

export const BROOD_STAGES: readonly BroodStage[] = ['eggs', 'eggs-with-legs', 'first-instar', 'second-instar'];

/**
 * The stage-numbering sets the trade uses (docs/rules.md, Stage numbering; docs/trade-facts.md §1):
 * `us` calls the first free-living young "1st instar", `de` counts nymphs N1, N2 after the prelarva.
 * One stage enum underneath; the set only changes the words (catalogue section `broodStage`).
 */
export const STAGE_NUMBERINGS = ['us', 'de'] as const;
export type StageNumbering = (typeof STAGE_NUMBERINGS)[number];

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

/** A stage's words in the reader's language and numbering set. */
export function broodStageLabel(t: Words, stage: BroodStage, numbering: StageNumbering = 'us'): string {
  broodStageIndex(stage);
  return t(`broodStage.${numbering}.${stage}`);
}
