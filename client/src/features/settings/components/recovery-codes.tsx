import { Alert, Button, List, Stack, Text } from '@mantine/core';

/** The recovery codes, shown once right after the set-up or a renewal (`notice` says which). */
export function RecoveryCodes({
  codes,
  onDone,
  notice = { title: 'Second factor on', body: 'Signing in now also asks for a code from your app.' },
}: {
  codes: string[];
  onDone: () => void;
  notice?: { title: string; body: string };
}) {
  return (
    <Stack maw={480}>
      <Alert color="moss" title={notice.title}>
        {notice.body}
      </Alert>
      <Text>These recovery codes let you sign in if you lose your phone. Each works once. Save them somewhere safe now: they are not shown again.</Text>
      <List ff="monospace" data-testid="recovery-codes">
        {codes.map((c) => (
          <List.Item key={c}>{c}</List.Item>
        ))}
      </List>
      <Button onClick={onDone} w="fit-content">
        I have saved them
      </Button>
    </Stack>
  );
}
