/**
 * The usual cautions for shipping live invertebrates, shown on the hand-over form and in
 * statements with a shipment. Sources: docs/trade-facts.md §9 (dealers' published shipping rules,
 * jrsinverts.com and fanghubtarantulas.com; CITES notes). Local law and the carrier's rules come first.
 */
export const SHIPPING_CAUTIONS: readonly string[] = [
  'Use an overnight service and send early in the week (Monday to Wednesday), so the parcel does not sit in a depot over the weekend.',
  'Pack in an insulated box, with a heat or cold pack as the weather needs.',
  'Dealers hold shipments when it is colder than about −4 °C or warmer than about 32 °C outdoors (25–90 °F); a stricter rule holds them outside 4–27 °C (40–80 °F).',
  'Check the carrier’s own rules first: not every carrier or postal service accepts live invertebrates.',
  'Species listed by CITES (for example every Brachypelma) need the papers the law asks for, and permits to cross a border.',
  'These are general cautions only; local law and the carrier’s rules take precedence.',
];
