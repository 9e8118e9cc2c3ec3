// Types for the hare-niemeyer package (a test-only reference; it ships none).
declare module 'hare-niemeyer' {
  /** With draw = false, parties tied for the last seat keep their raw (fractional) quota. */
  export default function hareNiemeyer(votes: Record<string, number>, seats: number, draw?: boolean): Record<string, number>;
}
