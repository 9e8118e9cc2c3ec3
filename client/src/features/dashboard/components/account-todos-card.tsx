import { Anchor, Group, Stack, Text } from '@mantine/core';
import { Link } from 'react-router';
import { formatMoney, type DashboardResponse } from '@broodsilk/shared';
import { paths } from '@/config/paths';
import { formatDate } from '@/lib/dates';
import { SectionCard } from '@/components/ui/section-card';

type Todos = Pick<DashboardResponse['dueToday'], 'termsToAccept' | 'handOversToConfirm' | 'payments'>;

function TodoLine({ projectId, title, text, to }: { projectId: string; title: string; text: string; to: string }) {
  return (
    <Group justify="space-between" wrap="nowrap" gap="xs" py={4} data-testid="account-todo">
      <Stack gap={0}>
        <Anchor component={Link} to={to} fw={600} size="sm">
          {title}
        </Anchor>
        <Text size="xs" c="dimmed" data-project={projectId}>
          {text}
        </Text>
      </Stack>
    </Group>
  );
}

/** Terms waiting for my acceptance, hand-overs waiting for my confirmation, money owed to me or by me. */
export function AccountTodosCard({ todos }: { todos: Todos }) {
  const count = todos.termsToAccept.length + todos.handOversToConfirm.length + todos.payments.length;
  return (
    <SectionCard compact title="Terms, hand-overs and money" testId="card-account-todos" accent={count ? 'amber' : undefined}>
      {count === 0 && (
        <Text size="sm" c="dimmed">
          Nothing to accept, confirm or pay.
        </Text>
      )}
      {todos.termsToAccept.map((t) => (
        <TodoLine
          key={`terms-${t.projectId}-${t.version}`}
          projectId={t.projectId}
          title={t.projectTitle}
          text={`Terms version ${t.version} waits for your acceptance`}
          to={paths.project.href(t.projectId)}
        />
      ))}
      {todos.handOversToConfirm.map((h) => (
        <TodoLine
          key={h.entryId}
          projectId={h.projectId}
          title={h.projectTitle}
          text={`Confirm the arrival of ${h.count} young handed over to ${h.partyName} on ${formatDate(h.date)}`}
          to={paths.projectAccount.href(h.projectId)}
        />
      ))}
      {todos.payments.map((p) => (
        <TodoLine
          key={`pay-${p.projectId}-${p.direction}-${p.otherName}`}
          projectId={p.projectId}
          title={p.projectTitle}
          text={
            p.direction === 'owed-by-me'
              ? `You owe ${p.otherName} ${formatMoney(p.amountMinor, p.currency)}`
              : `${p.otherName} owes you ${formatMoney(p.amountMinor, p.currency)}`
          }
          to={paths.projectAccount.href(p.projectId)}
        />
      ))}
    </SectionCard>
  );
}
