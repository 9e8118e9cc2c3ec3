import type { SpeciesGroup } from '../collection/species.types.js';
import { en } from './en.js';
import { wordsFor, type Words } from './words.js';

/**
 * Where every safety text comes from: the catalogue's `safety` section, in the reader's language.
 * Our own wording; each text defers to local law and licensed practice.
 */
export type SafetyText = Exclude<keyof typeof en.safety, 'groupCaution' | 'shipping'>;

export const safetyText = (t: Words, key: SafetyText, values?: Record<string, unknown>): string => t(`safety.${key}`, values);

/** The usual cautions for shipping live invertebrates (docs/trade-facts.md §9), in order. */
export const shippingCautions = (t: Words): string[] => Object.keys(en.safety.shipping).map((k) => t(`safety.shipping.${k}`));

/** The caution a species group always carries, with the deferral to law and physicians. */
export const groupCaution = (t: Words, group: SpeciesGroup): string => `${t(`safety.groupCaution.${group}`)} ${t('safety.law')}`;

/** The heat-source caution shown next to incubator settings, in English (stored API field). */
export const INCUBATOR_CAUTION = wordsFor('en')('safety.heatSource');

/**
 * The caution at the opening of a sac, by what the species' facts say of urticating hairs:
 * gloves and eye protection when the species has them, tools only when it is known to have none,
 * and the general caution (naming both cases) when the species is not known.
 */
export const openingCaution = (urticatingHairs: boolean | null): SafetyText =>
  urticatingHairs === null ? 'opening' : urticatingHairs ? 'openingHairs' : 'openingNoHairs';
