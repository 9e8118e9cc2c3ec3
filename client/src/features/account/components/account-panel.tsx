import { Alert, Button, Card, CloseButton, Group, Stack, Text } from '@mantine/core';
import { useState } from 'react';
import { todayIn, type Me, type ProjectRole } from '@broodsilk/shared';
import { useBalances } from '../api/balances';
import { useEntries } from '../api/entries';
import { useShares } from '../api/shares';
import { AwaitingMe } from './confirm-receipt-form';
import { BalancesPanel } from './balances-panel';
import { CorrectionForm } from './correction-form';
import { EntriesTable } from './entries-table';
import { HandOverForm } from './hand-over-form';
import { MoneyForm } from './money-form';
import { PayForm } from './pay-form';
import { PayoutSetup } from './payout-setup';
import { SharesPanel } from './shares-panel';
import { StatementActions } from './statement-actions';
import { WithdrawalForm } from './withdrawal-form';
import { SectionCard } from '@/components/ui/section-card';

type OwnerAction = 'hand-over' | 'sale' | 'cash-out' | 'money' | 'correction';
const OWNER_ACTIONS: { value: OwnerAction; label: string }[] = [
  { value: 'hand-over', label: 'Record a hand-over' },
  { value: 'sale', label: 'Record a sale' },
  { value: 'cash-out', label: 'Record a cash-out' },
  { value: 'money', label: 'Record a payment' },
  { value: 'correction', label: 'Correct an entry' },
];

export interface AccountPanelProps {
  projectId: string;
  me: Me;
  /** The viewer's role and party in this project (from the project page). */
  myRole: ProjectRole;
  myMemberId: string | null;
}

/**
 * The project's Account: shares, balance, entries and statements. The owner records entries; a
 * partner sees the same account read-only except confirming what reached them and paying what they owe.
 * Caretakers do not see the account.
 */
export function AccountPanel({ projectId, me, myRole, myMemberId }: AccountPanelProps) {
  const [action, setAction] = useState<OwnerAction | null>(null);
  const [payOutside, setPayOutside] = useState<string | null>(null);
  const shares = useShares(projectId);
  const balances = useBalances(projectId);
  const entries = useEntries(projectId);
  if (myRole === 'caretaker') return <Alert color="gray">The account of this project is seen by its owner and partners only.</Alert>;

  const isOwner = myRole === 'owner';
  const today = todayIn(me.timeZone, new Date());
  const sacs = shares.data?.sacs ?? [];
  const parties = balances.data?.parties ?? [];
  const currency = balances.data?.currency ?? shares.data?.terms?.currency ?? null;
  const awaiting = (entries.data ?? []).filter(
    (e) => myMemberId !== null && e.awaitingConfirmationBy?.memberId === myMemberId && e.status !== 'reversed' && e.status !== 'left-out',
  );
  const myDebts = (balances.data?.debts ?? []).filter((d) => d.fromPartyId === myMemberId);
  const owedToMe = (balances.data?.debts ?? []).some((d) => d.toPartyId === myMemberId);
  const close = () => setAction(null);

  return (
    <Stack data-testid="account-panel">
      {awaiting.length > 0 && (
        <SectionCard title="Waiting for you" testId="section-awaiting">
          <AwaitingMe projectId={projectId} entries={awaiting} today={today} />
        </SectionCard>
      )}

      {myDebts.length > 0 && (
        <SectionCard title="What you owe" testId="section-pay">
          <Stack>
            {myDebts.map((d) => (
              <Stack key={d.toPartyId} gap="xs">
                <PayForm projectId={projectId} toMemberId={d.toPartyId} toName={d.toName} owedMinor={d.amountMinor} currency={d.currency} />
                {payOutside === d.toPartyId ? (
                  <Card withBorder padding="sm">
                    <Group justify="space-between" mb="xs">
                      <Text size="sm" fw={600}>
                        A payment made outside Broodsilk
                      </Text>
                      <CloseButton aria-label="Close" onClick={() => setPayOutside(null)} />
                    </Group>
                    <MoneyForm
                      projectId={projectId}
                      parties={parties}
                      currency={d.currency}
                      today={today}
                      fromMemberId={myMemberId!}
                      toMemberId={d.toPartyId}
                      amountMinor={d.amountMinor}
                      onDone={() => setPayOutside(null)}
                    />
                  </Card>
                ) : (
                  <Group>
                    <Button variant="subtle" size="xs" onClick={() => setPayOutside(d.toPartyId)}>
                      I paid {d.toName} another way
                    </Button>
                  </Group>
                )}
              </Stack>
            ))}
          </Stack>
        </SectionCard>
      )}

      <SectionCard title="Balance" testId="section-balance">
        <BalancesPanel projectId={projectId} />
      </SectionCard>

      {isOwner && (
        <SectionCard title="Record in the account" testId="section-actions">
          <Stack>
            <Group gap="xs">
              {OWNER_ACTIONS.map((a) => (
                <Button
                  key={a.value}
                  size="xs"
                  variant={action === a.value ? 'filled' : 'light'}
                  onClick={() => setAction(action === a.value ? null : a.value)}
                >
                  {a.label}
                </Button>
              ))}
            </Group>
            {action && (
              <Card withBorder padding="sm">
                <Group justify="flex-end">
                  <CloseButton aria-label="Close the form" onClick={close} />
                </Group>
                {action === 'hand-over' && <HandOverForm projectId={projectId} today={today} sacs={sacs} onDone={close} />}
                {(action === 'sale' || action === 'cash-out') &&
                  (currency ? (
                    <WithdrawalForm
                      projectId={projectId}
                      kind={action}
                      parties={parties}
                      sacs={sacs}
                      currency={currency}
                      termsPriceMinor={shares.data?.terms?.pricePerSpiderlingMinor ?? null}
                      today={today}
                      onDone={close}
                    />
                  ) : (
                    <Text c="dimmed">No terms are in force yet.</Text>
                  ))}
                {action === 'money' &&
                  (currency ? (
                    <MoneyForm projectId={projectId} parties={parties} currency={currency} today={today} onDone={close} />
                  ) : (
                    <Text c="dimmed">No terms are in force yet.</Text>
                  ))}
                {action === 'correction' && <CorrectionForm projectId={projectId} today={today} onDone={close} />}
              </Card>
            )}
          </Stack>
        </SectionCard>
      )}

      <SectionCard title="Shares" testId="section-shares">
        <SharesPanel projectId={projectId} timeZone={me.timeZone} />
      </SectionCard>

      <SectionCard title="Entries" testId="section-entries">
        <EntriesTable projectId={projectId} />
      </SectionCard>

      <SectionCard title="Statement" testId="section-statement">
        <StatementActions projectId={projectId} parties={parties} fixedMemberId={isOwner ? undefined : (myMemberId ?? undefined)} />
      </SectionCard>

      {(isOwner || owedToMe) && (
        <SectionCard title="Receiving payments" testId="section-payouts">
          <PayoutSetup />
        </SectionCard>
      )}
    </Stack>
  );
}
