import { Alert, Button, List, Stack, Text } from '@mantine/core';
import { useWords } from '@/lib/i18n';

/** The recovery codes, shown once right after the set-up. */
export function RecoveryCodes({ codes, onDone }: { codes: string[]; onDone: () => void }) {
  const t = useWords();
  return (
    <Stack maw={480}>
      <Alert color="moss" title={t('page.settings.secondFactor.on')}>
        {t('page.settings.secondFactor.onText')}
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
