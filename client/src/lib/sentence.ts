import type { Words } from '@broodsilk/shared';

/** A sentence from a shared rule or the server: English `message`, and its catalogue `key` and `values` where it has them. */
export interface Sayable {
  message: string;
  key?: string;
  values?: Record<string, string | number>;
}

/**
 * The sentence in the reader's words: `t(key, values)` when it names a catalogue key this client
 * knows, else the English `message` as it came (an older server, or a key added after this build).
 */
export function sentence(t: Words, s: Sayable): string {
  if (!s.key) return s.message;
  const said = t(s.key, s.values);
  return said === s.key ? s.message : said;
}
