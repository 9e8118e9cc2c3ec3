import type { ValueSource } from '../collection/species.types.js';
import type { Words } from './words.js';

/** Where a value comes from, in the reader's words: the publication, or the mark `common practice` / `from memory`. */
export const valueSourceLabel = (t: Words, source: ValueSource): string => (source.kind === 'published' ? source.citation : t(`valueMark.${source.kind}`));
