import { Alert, Button, List, Stack, Text } from '@mantine/core';

/** The recovery codes, shown once right after the set-up. */
export function RecoveryCodes({ codes, onDone }: { codes: string[]; onDone: () => void }) {
  return (
    <Stack maw={480}>
      <Alert color="moss" title="Second factor on">
        Signing in now also asks for a code from your app.
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
