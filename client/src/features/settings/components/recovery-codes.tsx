import { Alert, Button, List, Stack, Text } from '@mantine/core';
import { useWords } from '@/lib/i18n';

/** The recovery codes, shown once right after the set-up or a renewal (`notice` says which; the set-up's by default). */
export function RecoveryCodes({ codes, onDone, notice }: { codes: string[]; onDone: () => void; notice?: { title: string; body: string } }) {
  const t = useWords();
  return (
    <Stack maw={480}>
      <Alert color="moss" title={notice?.title ?? t('page.settings.secondFactor.on')}>
        {notice?.body ?? t('page.settings.secondFactor.onText')}
      </Alert>
      <Text>{t('page.settings.secondFactor.recoveryText')}</Text>
      <List ff="monospace" data-testid="recovery-codes">
        {codes.map((c) => (
          <List.Item key={c}>{c}</List.Item>
        ))}
      </List>
      <Button onClick={onDone} w="fit-content">
        {t('page.settings.secondFactor.saved')}
      </Button>
    </Stack>
  );
}
