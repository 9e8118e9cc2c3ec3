import { Alert, Badge, Button, Card, Group, Stack, Text, Title } from '@mantine/core';
import type { Me, ProjectMemberResponse, ProjectRole, TermsLineResponse, TermsVersionResponse } from '@broodsilk/shared';
import { broodStageLabel, formatMoney } from '@broodsilk/shared';
import { currentNumbering, words } from '@/lib/i18n';
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
  if (!line.mustAccept)
    return (
      <Text size="sm" c="dimmed">
        proposer
      </Text>
    );
  return line.accepted ? (
    <Text size="sm" className="tone-ok">
      yes
    </Text>
  ) : (
    <Text size="sm" className="tone-due">
      not yet
    </Text>
  );
}

/** The terms of a project: the version in force, a newer proposed one (with accept), and a form to propose changes. */
export function TermsPanel({ projectId, me, myRole, members }: TermsPanelProps) {
  const terms = useTerms(projectId);
  const accept = useAcceptTerms(projectId);
  const [asking, setAsking] = useState<{ version: number; memberId?: string; name?: string } | null>(null);
  if (terms.isPending) return <Text c="dimmed">Loading the terms…</Text>;
  if (terms.isError) return <Alert color="clay">{terms.error.message}</Alert>;

  const shown = terms.data.versions.filter((v) => v.status !== 'superseded').sort((a, b) => b.number - a.number);
  const myMember = members.find((m) => m.userId === me.id);
  const latest = terms.data.versions.reduce<TermsVersionResponse | undefined>((a, v) => (!a || v.number > a.number ? v : a), undefined);

  return (
    <Stack data-testid="terms-panel">
      {shown.length === 0 && (
        <Text c="dimmed">No terms yet. {myRole === 'owner' ? 'Propose how the brood is split below.' : 'The keeper has not proposed any.'}</Text>
      )}
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
                  Version {v.number}
                </Title>
                {v.status === 'in-force' ? (
                  <Badge color="moss">In force</Badge>
                ) : (
                  <Badge color="amber" variant="light">
                    Proposed
                  </Badge>
                )}
              </Group>
              <Text size="xs" c="dimmed">
                by {v.createdBy.name}, {formatInstant(v.createdAt, me.timeZone)}
              </Text>
            </Group>
            <PartyTable
              label={`Parties of version ${v.number}`}
              minWidth={300}
              striped
              small
              rows={[...v.lines].sort((a, b) => a.pickOrder - b.pickOrder)}
              rowKey={(l) => l.memberId}
              columns={[
                {
                  header: 'Party',
                  cell: (l) => (
                    <>
                      {l.memberName}
                      <Text size="xs" c="dimmed" hiddenFrom="sm">
                        picks #{l.pickOrder}
                        {l.fixedCount > 0 ? ` · ${l.fixedCount} first` : ''}
                      </Text>
                    </>
                  ),
                },
                {
                  header: 'Share',
                  cell: (l) => (
                    <>
                      {l.share}{' '}
                      <Text span size="xs" c="dimmed">
                        (weight {l.weight})
                      </Text>
                    </>
                  ),
                },
                { header: 'Taken first', wide: true, cell: (l) => (l.fixedCount > 0 ? l.fixedCount : '—') },
                { header: 'Picks', wide: true, cell: (l) => `#${l.pickOrder}` },
                { header: 'Accepted', cell: (l) => <Acceptance line={l} /> },
              ]}
            />
            <Text size="sm" mt="xs">
              {formatMoney(v.pricePerSpiderlingMinor, v.currency)} per spiderling · {FAILURE_CLAUSE_LABELS[v.failureClause]} · handed over at{' '}
              {broodStageLabel(words, v.handOverStage, currentNumbering()).toLowerCase()} · shipping: {SHIPPING_LABELS[v.shippingPaidBy].toLowerCase()}
            </Text>
            {v.note && (
              <Text size="sm" c="dimmed">
                {v.note}
              </Text>
            )}
            {v.status === 'proposed' && v.awaiting.length > 0 && (
              <Text size="sm" className="tone-due" mt={4}>
                Waiting for {v.awaiting.map((a) => a.name).join(', ')} to accept.
              </Text>
            )}
            {mayAccept && (
              <Group mt="sm">
                <Button loading={accept.isPending} disabled={accept.isPending} onClick={() => setAsking({ version: v.number })}>
                  Accept these terms
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
                  Record {a.name}&apos;s acceptance
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
          title={asking.name ? `Record ${asking.name}'s acceptance` : 'Accept these terms'}
          confirmLabel={asking.name ? 'Record the acceptance' : 'Yes, accept version ' + asking.version}
          pending={accept.isPending}
          message={accept.isError ? accept.error.message : null}
          onConfirm={() =>
            accept.mutate(
              asking.memberId
                ? { version: asking.version, body: { memberId: asking.memberId, note: 'Recorded by the keeper on their behalf.' } }
                : { version: asking.version },
              { onSuccess: () => setAsking(null) },
            )
          }
        >
          <Text size="sm">
            {asking.name ? `${asking.name} agrees` : 'You agree'} to version {asking.version}: the split and prices shown above. When every partner has
            accepted, it replaces the terms in force. An acceptance cannot be withdrawn; a change needs a new version.
          </Text>
        </ConfirmAction>
      )}
      {myRole === 'owner' && <ProposeTermsForm projectId={projectId} members={members} base={latest} />}
    </Stack>
  );
}
