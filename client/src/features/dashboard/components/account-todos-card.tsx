import { Anchor, Group, Stack, Text } from '@mantine/core';
import { Link } from 'react-router';
import { formatMoney, type DashboardResponse } from '@broodsilk/shared';
import { paths } from '@/config/paths';
import { SectionCard } from '@/components/ui/section-card';
import { useWords } from '@/lib/i18n';

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
  const t = useWords();
  const count = todos.termsToAccept.length + todos.handOversToConfirm.length + todos.payments.length;
  return (
    <SectionCard compact title={t('page.dashboard.todos.title')} testId="card-account-todos" accent={count ? 'amber' : undefined}>
      {count === 0 && (
        <Text size="sm" c="dimmed">
          {t('page.dashboard.todos.none')}
        </Text>
      )}
      {todos.termsToAccept.map((terms) => (
        <TodoLine
          key={`terms-${terms.projectId}-${terms.version}`}
          projectId={terms.projectId}
          title={terms.projectTitle}
          text={t('page.dashboard.todos.terms', { version: terms.version })}
          to={paths.project.href(terms.projectId)}
        />
      ))}
      {todos.handOversToConfirm.map((h) => (
        <TodoLine
          key={h.entryId}
          projectId={h.projectId}
          title={h.projectTitle}
          text={t(h.mine ? 'page.account.todo.handOverMine' : 'page.account.todo.handOverFor', { count: h.count, party: h.partyName, date: h.date })}
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
              ? t('page.dashboard.todos.youOwe', { other: p.otherName, amount: formatMoney(p.amountMinor, p.currency) })
              : t('page.dashboard.todos.owesYou', { other: p.otherName, amount: formatMoney(p.amountMinor, p.currency) })
          }
          to={paths.projectAccount.href(p.projectId)}
        />
      ))}
    </SectionCard>
  );
}
