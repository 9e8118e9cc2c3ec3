import { Alert, Badge, Button, Group, NativeSelect, Stack, Text } from '@mantine/core';
import { useState } from 'react';
import { usePayoutAccount, useCreatePayoutAccount } from '../api/settlements';

const COUNTRIES = [
  ['DE', 'Germany'],
  ['AT', 'Austria'],
  ['BE', 'Belgium'],
  ['CH', 'Switzerland'],
  ['CZ', 'Czechia'],
  ['DK', 'Denmark'],
  ['ES', 'Spain'],
  ['FR', 'France'],
  ['GB', 'United Kingdom'],
  ['IE', 'Ireland'],
  ['IT', 'Italy'],
  ['NL', 'Netherlands'],
  ['PL', 'Poland'],
  ['PT', 'Portugal'],
  ['SE', 'Sweden'],
  ['US', 'United States'],
  ['CA', 'Canada'],
  ['AU', 'Australia'],
] as const;

/** A keeper who receives money links a payout account and finishes onboarding on the provider's page. */
export function PayoutSetup({ goTo = (url: string) => window.location.assign(url) }: { goTo?: (url: string) => void }) {
  const account = usePayoutAccount();
  const create = useCreatePayoutAccount();
  const [country, setCountry] = useState('DE');
  if (account.isPending) return <Text c="dimmed">Loading payout account…</Text>;
  if (account.isError) return <Alert color="clay">{account.error.message}</Alert>;
  const a = account.data;
  const ready = a.linked && a.payoutsEnabled && a.chargesEnabled;
  const start = async () => {
    const linked = await create.mutateAsync({ country });
    if (linked.onboardingUrl) goTo(linked.onboardingUrl);
  };
  return (
    <Stack gap="xs" data-testid="payout-setup">
      <Group gap="xs">
        <Text size="sm" fw={600}>
          Payouts
        </Text>
        {ready ? (
          <Badge color="moss" variant="light" tt="none">
            Ready to receive payments
          </Badge>
        ) : a.linked ? (
          <Badge color="amber" variant="light" tt="none">
            {a.detailsSubmitted ? 'Waiting for the provider to check the details' : 'Onboarding not finished'}
          </Badge>
        ) : (
          <Badge color="gray" variant="light" tt="none">
            Not set up
          </Badge>
        )}
      </Group>
      {!ready && (
        <>
          <Text size="sm" c="dimmed">
            Partners can pay what they owe you by card once you have a payout account with the payment provider.
          </Text>
          <Group align="flex-end">
            {!a.linked && (
              <NativeSelect
                label="Country of your bank account"
                data={COUNTRIES.map(([value, label]) => ({ value, label }))}
                value={country}
                onChange={(e) => setCountry(e.currentTarget.value)}
              />
            )}
            <Button variant="light" loading={create.isPending} onClick={() => void start().catch(() => undefined)}>
              {a.linked ? 'Finish setting up payouts' : 'Set up payouts'}
            </Button>
          </Group>
          {create.isError && (
            <Alert color="clay" role="alert">
              {create.error.message}
            </Alert>
          )}
        </>
      )}
    </Stack>
  );
}
