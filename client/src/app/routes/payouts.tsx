import { Alert, Card, Stack, Text } from '@mantine/core';
import { useSearchParams } from 'react-router';
import { PageHeader } from '@/components/ui/page-header';
import { PayoutSetup } from '@/features/account/components/payout-setup';
import { useWords } from '@/lib/i18n';

/** Where the payment provider's onboarding sends the keeper back to: the payout account's state. */
export function Component() {
  const t = useWords();
  const [search] = useSearchParams();
  return (
    <Stack>
      <PageHeader title={t('page.account.payoutsPage.title')} description={t('page.account.payoutsPage.description')} />
      {search.has('again') && (
        <Alert color="amber" maw={640}>
          {t('page.account.payoutsPage.linkExpired')}
        </Alert>
      )}
      <Card withBorder maw={640}>
        <PayoutSetup />
      </Card>
      <Text size="xs" c="dimmed">
        {t('page.account.payoutsPage.bankDetails')}
      </Text>
    </Stack>
  );
}
