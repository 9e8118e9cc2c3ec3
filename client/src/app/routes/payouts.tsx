import { Alert, Card, Stack, Text } from '@mantine/core';
import { useSearchParams } from 'react-router';
import { PageHeader } from '@/components/ui/page-header';
import { PayoutSetup } from '@/features/account/components/payout-setup';

/** Where the payment provider's onboarding sends the keeper back to: the payout account's state. */
export function Component() {
  const [search] = useSearchParams();
  return (
    <Stack>
      <PageHeader title="Payouts" description="Receive what partners pay you through the payment provider." />
      {search.has('again') && (
        <Alert color="amber" maw={640}>
          The set-up link had run out. Start again below; it takes you back to the payment provider.
        </Alert>
      )}
      <Card withBorder maw={640}>
        <PayoutSetup />
      </Card>
      <Text size="xs" c="dimmed">
        Broodsilk never sees your bank details; the payment provider keeps them.
      </Text>
    </Stack>
  );
}
