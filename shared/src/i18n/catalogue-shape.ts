/** A catalogue's shape with every text widened to `string`: another language must fill the same keys. */
export type Widen<T> = { -readonly [K in keyof T]: T[K] extends string ? string : Widen<T[K]> };
