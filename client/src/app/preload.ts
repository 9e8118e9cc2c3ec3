/**
 * Waits for the queries of a page's panels, started together (pass `qc.ensureQueryData(...)` calls, or
 * `false` for a panel this viewer does not see). A failure is not thrown: the panel shows its own error
 * while the rest of the page opens.
 */
export async function preloadPanels(...loads: (Promise<unknown> | false)[]): Promise<void> {
  await Promise.allSettled(loads.filter((load) => load !== false));
}
