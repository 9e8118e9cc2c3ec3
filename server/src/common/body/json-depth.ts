/**
 * The deepest nesting of `{` and `[` in JSON text, counted on the raw bytes before anything parses
 * them (parsing is iterative, but validating and transforming the result recurses and would
 * overflow the stack). Brackets inside strings do not count.
 */
export function jsonDepthExceeds(bytes: Uint8Array, max: number): boolean {
  const OPEN_OBJECT = 0x7b,
    CLOSE_OBJECT = 0x7d,
    OPEN_ARRAY = 0x5b,
    CLOSE_ARRAY = 0x5d,
    QUOTE = 0x22,
    BACKSLASH = 0x5c;
  let depth = 0;
  let inString = false;
  for (let i = 0; i < bytes.length; i += 1) {
    const b = bytes[i];
    if (inString) {
      if (b === BACKSLASH) i += 1;
      else if (b === QUOTE) inString = false;
    } else if (b === QUOTE) inString = true;
    else if (b === OPEN_OBJECT || b === OPEN_ARRAY) {
      depth += 1;
      if (depth > max) return true;
    } else if (b === CLOSE_OBJECT || b === CLOSE_ARRAY) depth -= 1;
  }
  return false;
}
