import { Alert, Button, Card, CloseButton, Group, Stack, Text } from '@mantine/core';
import { useState } from 'react';
import { RECORDABLE_ENTRY_KINDS, todayIn, type Me, type ProjectRole, type RecordableEntryKind } from '@broodsilk/shared';
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
import { useWords } from '@/lib/i18n';

type OwnerAction = RecordableEntryKind;
const OWNER_ACTIONS: readonly OwnerAction[] = RECORDABLE_ENTRY_KINDS;

export interface AccountPanelProps {
  projectId: string;
  me: Me;
  /** The viewer's role and party in this project (from the project page). */
  myRole: ProjectRole;
  myMemberId: string | null;
  /** The protected-trade listing of the project's species (e.g. "CITES Appendix II"), for the sale form's caution; null when not listed or not known. */
  tradeListing?: string | null;
}

/**
 * The project's Account: shares, balance, entries and statements. The owner records entries; a
 * partner sees the same account read-only except confirming what reached them and paying what they owe.
 * Caretakers do not see the account.
 */
export function AccountPanel({ projectId, me, myRole, myMemberId, tradeListing = null }: AccountPanelProps) {
  const t = useWords();
  const [action, setAction] = useState<OwnerAction | null>(null);
  const [payOutside, setPayOutside] = useState<string | null>(null);
  const shares = useShares(projectId);
  const balances = useBalances(projectId);
  const entries = useEntries(projectId);
  if (myRole === 'caretaker') return <Alert color="gray">{t('page.account.partiesOnly')}</Alert>;

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
        <SectionCard title={t('page.account.panel.awaiting')} testId="section-awaiting">
          <AwaitingMe projectId={projectId} entries={awaiting} today={today} />
        </SectionCard>
      )}

      {myDebts.length > 0 && (
        <SectionCard title={t('page.account.panel.owe')} testId="section-pay">
          <Stack>
            {myDebts.map((d) => (
              <Stack key={d.toPartyId} gap="xs">
                <PayForm projectId={projectId} toMemberId={d.toPartyId} toName={d.toName} owedMinor={d.amountMinor} currency={d.currency} />
                {payOutside === d.toPartyId ? (
                  <Card withBorder padding="sm">
                    <Group justify="space-between" mb="xs">
                      <Text size="sm" fw={600}>
                        {t('page.account.panel.paidOutside')}
                      </Text>
                      <CloseButton aria-label={t('page.account.panel.close')} onClick={() => setPayOutside(null)} />
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
                      {t('page.account.panel.paidAnotherWay', { name: d.toName })}
                    </Button>
                  </Group>
                )}
              </Stack>
            ))}
          </Stack>
        </SectionCard>
      )}

      <SectionCard title={t('page.account.panel.balance')} testId="section-balance">
        <BalancesPanel projectId={projectId} />
      </SectionCard>

      {isOwner && (
        <SectionCard title={t('page.account.panel.record')} testId="section-actions">
          <Stack>
            <Group gap="xs">
              {OWNER_ACTIONS.map((a) => (
                <Button key={a} size="xs" variant={action === a ? 'filled' : 'light'} onClick={() => setAction(action === a ? null : a)}>
                  {t(`page.account.action.${a}`)}
                </Button>
              ))}
            </Group>
            {action && (
              <Card withBorder padding="sm">
                <Group justify="flex-end">
                  <CloseButton aria-label={t('page.account.panel.closeForm')} onClick={close} />
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
                      tradeListing={tradeListing}
                      today={today}
                      onDone={close}
                    />
                  ) : (
                    <Text c="dimmed">{t('page.account.panel.noTerms')}</Text>
                  ))}
                {action === 'money' &&
                  (currency ? (
                    <MoneyForm projectId={projectId} parties={parties} currency={currency} today={today} onDone={close} />
                  ) : (
                    <Text c="dimmed">{t('page.account.panel.noTerms')}</Text>
                  ))}
                {action === 'correction' && <CorrectionForm projectId={projectId} today={today} onDone={close} />}
              </Card>
            )}
          </Stack>
        </SectionCard>
      )}

      <SectionCard title={t('page.account.panel.shares')} testId="section-shares">
        <SharesPanel projectId={projectId} timeZone={me.timeZone} />
      </SectionCard>

      <SectionCard title={t('page.account.panel.entries')} testId="section-entries">
        <EntriesTable projectId={projectId} />
      </SectionCard>

      <SectionCard title={t('page.account.panel.statement')} testId="section-statement">
        <StatementActions projectId={projectId} parties={parties} fixedMemberId={isOwner ? undefined : (myMemberId ?? undefined)} />
      </SectionCard>

      {(isOwner || owedToMe) && (
        <SectionCard title={t('page.account.panel.payouts')} testId="section-payouts">
          <PayoutSetup />
        </SectionCard>
      )}
    </Stack>
  );
}
