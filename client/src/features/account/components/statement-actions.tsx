import { Alert, Anchor, Button, Group, NativeSelect, Stack, Text } from '@mantine/core';
import { useState } from 'react';
import type { PartyRef } from '@broodsilk/shared';
import { useWords } from '@/lib/i18n';
import { statementFileUrl, useEmailStatement } from '../api/statements';

/** A party's statement as a CSV or PDF file, or e-mailed to that party. The owner picks the party; a partner gets their own. */
export function StatementActions({ projectId, parties, fixedMemberId }: { projectId: string; parties: PartyRef[]; fixedMemberId?: string }) {
  const t = useWords();
  const [chosen, setMemberId] = useState<string | null>(null);
  const email = useEmailStatement(projectId);
  // The parties arrive with the balances: until one is chosen, the first one is meant.
  const memberId = fixedMemberId ?? chosen ?? parties[0]?.memberId ?? '';
  if (!memberId) return <Text c="dimmed">{t('page.account.statementActions.none')}</Text>;
  const name = parties.find((p) => p.memberId === memberId)?.name ?? t('page.account.statementActions.theParty');
  return (
    <Stack gap="xs" data-testid="statement-actions">
      {!fixedMemberId && (
        <NativeSelect
          label={t('page.account.statementActions.for')}
          maw={320}
          data={parties.map((p) => ({ value: p.memberId, label: p.name }))}
          value={memberId}
          onChange={(e) => {
            setMemberId(e.currentTarget.value);
            email.reset();
          }}
        />
      )}
      <Group gap="md">
        <Anchor href={statementFileUrl(projectId, memberId, 'csv')} download>
          {t('page.account.statementActions.csv')}
        </Anchor>
        <Anchor href={statementFileUrl(projectId, memberId, 'pdf')} download>
          {t('page.account.statementActions.pdf')}
        </Anchor>
        <Button size="xs" variant="light" loading={email.isPending} onClick={() => email.mutate(memberId)}>
          {t('page.account.statementActions.email', { name })}
        </Button>
      </Group>
      {email.isSuccess && (
        <Text size="sm" className="tone-ok" role="status">
          {t('page.account.statementActions.emailed', { name })}
        </Text>
      )}
      {email.isError && (
        <Alert color="clay" role="alert">
          {email.error.message}
        </Alert>
      )}
    </Stack>
  );
}
