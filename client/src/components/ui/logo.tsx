import { Group, Text } from '@mantine/core';
import { useWords } from '@/lib/i18n';

/** Our mark: a round egg sac held in strands of silk (same drawing as public/broodsilk-mark.svg). */
export function BroodsilkMark({ size = 28 }: { size?: number }) {
  const t = useWords();
  return (
    <svg width={size} height={size} viewBox="0 0 64 64" role="img" aria-label={t('page.shell.mark')}>
      <rect width="64" height="64" rx="14" fill="#2F5D50" />
      <path
        d="M8 20 C22 26, 42 26, 56 20 M8 44 C22 38, 42 38, 56 44 M20 8 C26 22, 26 42, 20 56 M44 8 C38 22, 38 42, 44 56"
        fill="none"
        stroke="#CFE3DA"
        strokeWidth="1.6"
        strokeLinecap="round"
        opacity="0.85"
      />
      <circle cx="32" cy="32" r="12.5" fill="#F4EEE3" />
      <circle cx="28" cy="29" r="2.4" fill="#D98E04" />
      <circle cx="35" cy="28" r="2.4" fill="#D98E04" />
      <circle cx="31" cy="35.5" r="2.4" fill="#D98E04" />
      <circle cx="37.5" cy="34.5" r="2.4" fill="#D98E04" opacity="0.8" />
    </svg>
  );
}

export function BroodsilkLogo() {
  const t = useWords();
  return (
    <Group gap={8} wrap="nowrap">
      <BroodsilkMark />
      <Text fw={700} size="lg" className="tone-ok">
        {t('page.shell.brand')}
      </Text>
    </Group>
  );
}
