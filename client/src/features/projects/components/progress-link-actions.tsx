import { Button, Code, CopyButton, Group, Stack, Text } from '@mantine/core';
import { useState } from 'react';
import type { ProjectMemberResponse } from '@broodsilk/shared';
import { ConfirmAction } from '@/components/ui/confirm-action';
import { isApiError } from '@/lib/api-error';
import { useWords } from '@/lib/i18n';
import { useIssueProgressLink, useRevokeProgressLink } from '../api/progress-links';

type Pending = 'new' | 'revoke' | null;

/**
 * The owner's actions on an outside party's row: send a progress link (its address is shown once,
 * to copy), make a new one (the earlier stops working) or revoke it.
 */
export function ProgressLinkActions({ projectId, member }: { projectId: string; member: ProjectMemberResponse }) {
  const t = useWords();
  const issue = useIssueProgressLink(projectId);
  const revoke = useRevokeProgressLink(projectId);
  const [url, setUrl] = useState<string | null>(null);
  const [done, setDone] = useState<string | null>(null);
  const [asking, setAsking] = useState<Pending>(null);
  const [message, setMessage] = useState<string | null>(null);
  const failed = (e: unknown) => setMessage(isApiError(e) ? e.message : String(e));
  const close = () => {
    setAsking(null);
    setMessage(null);
  };
  const send = () =>
    issue.mutate(member.id, {
      onSuccess: (r) => {
        setUrl(r.url);
        setDone(null);
        close();
      },
      onError: failed,
    });
  const stop = () =>
    revoke.mutate(member.id, {
      onSuccess: () => {
        setUrl(null);
        setDone(t('page.progress.revokeDone'));
        close();
      },
      onError: failed,
    });
  return (
    <Stack gap={4} data-testid="progress-link-actions">
      <Group gap={6} wrap="nowrap">
        <Button size="compact-xs" variant="light" onClick={() => setAsking('new')}>
          {url ? t('page.progress.newLink') : t('page.progress.send')}
        </Button>
        <Button size="compact-xs" variant="subtle" color="clay" onClick={() => setAsking('revoke')}>
          {t('page.progress.revoke')}
        </Button>
      </Group>
      {message && !asking && (
        <Text size="xs" c="clay" role="alert">
          {message}
        </Text>
      )}
      {done && <Text size="xs">{done}</Text>}
      {url && (
        <Stack gap={4}>
          <Text size="xs">{t('page.progress.shownOnce', { name: member.name })}</Text>
          <Code block>{url}</Code>
          <CopyButton value={url}>
            {({ copied, copy }) => (
              <Button size="compact-xs" variant="default" onClick={copy}>
                {copied ? t('page.progress.copied') : t('page.progress.copy')}
              </Button>
            )}
          </CopyButton>
        </Stack>
      )}
      <ConfirmAction
        opened={asking !== null}
        onClose={close}
        title={t('page.progress.linkTitle')}
        message={message}
        confirmLabel={t(asking === 'revoke' ? 'page.progress.revoke' : url ? 'page.progress.newLink' : 'page.progress.send')}
        pending={issue.isPending || revoke.isPending}
        onConfirm={asking === 'revoke' ? stop : send}
      >
        <Text size="sm">{t(asking === 'revoke' ? 'page.progress.revokeConfirm' : 'page.progress.newLinkConfirm', { name: member.name })}</Text>
      </ConfirmAction>
    </Stack>
  );
}
