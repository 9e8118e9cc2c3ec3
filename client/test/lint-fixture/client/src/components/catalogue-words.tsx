// Words from the catalogue; codes and symbols in the markup are not words.
declare function t(key: string): string;

export function CatalogueWords({ alive }: { alive: number }) {
  return (
    <label title={t('page.sacs.alive')} data-testid="alive-count">
      {t('page.sacs.youngCounted')} · {alive}
    </label>
  );
}
