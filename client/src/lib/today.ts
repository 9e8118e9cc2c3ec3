import i18next from 'i18next';

/** "Tuesday 1 December 2026 in Europe/Berlin": today as the viewer's zone sees it. */
export function todayLabel(timeZone: string, now = new Date()): string {
  const date = new Intl.DateTimeFormat(i18next.language === 'de' ? 'de-DE' : 'en-GB', {
    timeZone,
    weekday: 'long',
    day: 'numeric',
    month: 'long',
    year: 'numeric',
  }).format(now);
  return `${date} · ${timeZone}`;
}
