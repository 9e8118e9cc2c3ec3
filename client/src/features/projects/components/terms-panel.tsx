import { Alert, Badge, Button, Card, Group, Stack, Text, Title } from '@mantine/core';
import type { Me, ProjectMemberResponse, ProjectRole, TermsLineResponse, TermsVersionResponse } from '@broodsilk/shared';
import { broodStageLabel, formatMoney } from '@broodsilk/shared';
import { currentNumbering, useWords } from '@/lib/i18n';
import { formatInstant } from '@/lib/dates';
import { useState } from 'react';
import { ConfirmAction } from '@/components/ui/confirm-action';
import { PartyTable } from '@/components/ui/party-table';
import { useAcceptTerms, useTerms } from '../api/terms';
import { FAILURE_CLAUSE_LABELS, SHIPPING_LABELS } from '../utils/labels';
import { ProposeTermsForm } from './propose-terms-form';

interface TermsPanelProps {
  projectId: string;
  me: Pick<Me, 'id' | 'timeZone'>;
  myRole: ProjectRole;
  members: ProjectMemberResponse[];
}

/** Whether a party has accepted a version: the proposer needs not. */
function Acceptance({ line }: { line: TermsLineResponse }) {
  const t = useWords();
  if (!line.mustAccept)
    return (
      <Text size="sm" c="dimmed">
        {t('page.projects.terms.proposer')}
      </Text>
    );
  return line.accepted ? (
    <Text size="sm" className="tone-ok">
      {t('page.projects.terms.yes')}
    </Text>
  ) : (
    <Text size="sm" className="tone-due">
      {t('page.projects.terms.notYet')}
    </Text>
  );
}

/** The terms of a project: the version in force, a newer proposed one (with accept), and a form to propose changes. */
export function TermsPanel({ projectId, me, myRole, members }: TermsPanelProps) {
  const t = useWords();
  const terms = useTerms(projectId);
  const accept = useAcceptTerms(projectId);
  const [asking, setAsking] = useState<{ version: number; memberId?: string; name?: string } | null>(null);
  if (terms.isPending) return <Text c="dimmed">{t('page.projects.terms.loading')}</Text>;
  if (terms.isError) return <Alert color="clay">{terms.error.message}</Alert>;

  const shown = terms.data.versions.filter((v) => v.status !== 'superseded').sort((a, b) => b.number - a.number);
  const myMember = members.find((m) => m.userId === me.id);
  const latest = terms.data.versions.reduce<TermsVersionResponse | undefined>((a, v) => (!a || v.number > a.number ? v : a), undefined);

  return (
    <Stack data-testid="terms-panel">
      {shown.length === 0 && <Text c="dimmed">{t(myRole === 'owner' ? 'page.projects.terms.noneOwner' : 'page.projects.terms.noneOther')}</Text>}
      {shown.map((v) => {
        const myLine = v.lines.find((l) => l.memberId === myMember?.id);
        const mayAccept = v.status === 'proposed' && myRole === 'partner' && !!myLine && myLine.mustAccept && !myLine.accepted;
        const outsideAwaiting =
          v.status === 'proposed' && myRole === 'owner' ? v.awaiting.filter((a) => !members.find((m) => m.id === a.memberId)?.hasAccount) : [];
        return (
          <Card key={v.number} withBorder data-testid={`terms-version-${v.number}`}>
            <Group justify="space-between" mb="xs" wrap="wrap">
              <Group gap="xs">
                <Title order={4} size="h5">
                  {t('page.projects.terms.version', { number: v.number })}
                </Title>
                {v.status === 'in-force' ? (
                  <Badge color="moss">{t('page.projects.terms.inForce')}</Badge>
                ) : (
                  <Badge color="amber" variant="light">
                    {t('page.projects.terms.proposed')}
                  </Badge>
                )}
              </Group>
              <Text size="xs" c="dimmed">
                {t('page.projects.terms.by', { name: v.createdBy.name, when: formatInstant(v.createdAt, me.timeZone) })}
              </Text>
            </Group>
            <PartyTable
              label={t('page.projects.terms.tableLabel', { number: v.number })}
              minWidth={300}
              striped
              small
              rows={[...v.lines].sort((a, b) => a.pickOrder - b.pickOrder)}
              rowKey={(l) => l.memberId}
              columns={[
                {
                  header: t('page.projects.party'),
                  cell: (l) => (
                    <>
                      {l.memberName}
                      <Text size="xs" c="dimmed" hiddenFrom="sm">
                        {t('page.projects.terms.picks', { order: l.pickOrder })}
                        {l.fixedCount > 0 ? t('page.projects.terms.takenFirstShort', { count: l.fixedCount }) : ''}
                      </Text>
                    </>
                  ),
                },
                {
                  header: t('page.projects.terms.share'),
                  cell: (l) => (
                    <>
                      {l.share}{' '}
                      <Text span size="xs" c="dimmed">
                        {t('page.projects.terms.weight', { weight: l.weight })}
                      </Text>
                    </>
                  ),
                },
                { header: t('page.projects.terms.takenFirst'), wide: true, cell: (l) => (l.fixedCount > 0 ? l.fixedCount : '—') },
                { header: t('page.projects.terms.picksHeader'), wide: true, cell: (l) => `#${l.pickOrder}` },
                { header: t('page.projects.terms.accepted'), cell: (l) => <Acceptance line={l} /> },
              ]}
            />
            <Text size="sm" mt="xs">
              {t('page.projects.terms.deal', {
                price: formatMoney(v.pricePerSpiderlingMinor, v.currency),
                clause: FAILURE_CLAUSE_LABELS[v.failureClause],
                stage: broodStageLabel(t, v.handOverStage, currentNumbering()),
                shipping: SHIPPING_LABELS[v.shippingPaidBy],
              })}
            </Text>
            {v.note && (
              <Text size="sm" c="dimmed">
                {v.note}
              </Text>
            )}
            {v.status === 'proposed' && v.awaiting.length > 0 && (
              <Text size="sm" className="tone-due" mt={4}>
                {t('page.projects.terms.waiting', { names: v.awaiting.map((a) => a.name).join(', ') })}
              </Text>
            )}
            {mayAccept && (
              <Group mt="sm">
                <Button loading={accept.isPending} disabled={accept.isPending} onClick={() => setAsking({ version: v.number })}>
                  {t('page.projects.terms.accept')}
                </Button>
              </Group>
            )}
            {outsideAwaiting.map((a) => (
              <Group mt="sm" key={a.memberId}>
                <Button
                  variant="light"
                  size="xs"
                  loading={accept.isPending}
                  disabled={accept.isPending}
                  onClick={() => setAsking({ version: v.number, memberId: a.memberId, name: a.name })}
                >
                  {t('page.projects.terms.recordFor', { name: a.name })}
                </Button>
              </Group>
            ))}
          </Card>
        );
      })}
      {asking && (
        <ConfirmAction
          opened
          onClose={() => setAsking(null)}
          title={asking.name ? t('page.projects.terms.recordFor', { name: asking.name }) : t('page.projects.terms.accept')}
          confirmLabel={asking.name ? t('page.projects.terms.recordConfirm') : t('page.projects.terms.acceptConfirm', { number: asking.version })}
          pending={accept.isPending}
          message={accept.isError ? accept.error.message : null}
          onConfirm={() =>
            accept.mutate(
              asking.memberId
                ? { version: asking.version, body: { memberId: asking.memberId, note: t('page.projects.terms.recordedNote') } }
                : { version: asking.version },
              { onSuccess: () => setAsking(null) },
            )
          }
        >
          <Text size="sm">
            {asking.name
              ? t('page.projects.terms.theyAgree', { name: asking.name, number: asking.version })
              : t('page.projects.terms.youAgree', { number: asking.version })}
          </Text>
        </ConfirmAction>
      )}
      {myRole === 'owner' && <ProposeTermsForm projectId={projectId} members={members} base={latest} />}
    </Stack>
  );
}
