import { Alert, Badge, Button, Group, NativeSelect, Stack, Text } from '@mantine/core';
import { useState } from 'react';
import { i18next, useWords } from '@/lib/i18n';
import { usePayoutAccount, useCreatePayoutAccount } from '../api/settlements';

/** Countries a payout account can be opened in (ISO 3166-1 alpha-2), named in the reader's language by Intl.DisplayNames. */
const COUNTRIES = ['DE', 'AT', 'BE', 'CH', 'CZ', 'DK', 'ES', 'FR', 'GB', 'IE', 'IT', 'NL', 'PL', 'PT', 'SE', 'US', 'CA', 'AU'] as const;

/** Country options in the reader's language, in the order above (home markets first). */
export function countryOptions(language: string): { value: string; label: string }[] {
  const names = new Intl.DisplayNames([language], { type: 'region' });
  return COUNTRIES.map((value) => ({ value, label: names.of(value) ?? value }));
}

/** A keeper who receives money links a payout account and finishes onboarding on the provider's page. */
export function PayoutSetup({ goTo = (url: string) => window.location.assign(url) }: { goTo?: (url: string) => void }) {
  const t = useWords();
  const account = usePayoutAccount();
  const create = useCreatePayoutAccount();
  const [country, setCountry] = useState('DE');
  if (account.isPending) return <Text c="dimmed">{t('page.account.payout.loading')}</Text>;
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
          {t('page.account.payout.heading')}
        </Text>
        {ready ? (
          <Badge color="moss" variant="light" tt="none">
            {t('page.account.payout.ready')}
          </Badge>
        ) : a.linked ? (
          <Badge color="amber" variant="light" tt="none">
            {t(a.detailsSubmitted ? 'page.account.payout.checking' : 'page.account.payout.unfinished')}
          </Badge>
        ) : (
          <Badge color="gray" variant="light" tt="none">
            {t('page.account.payout.notSetUp')}
          </Badge>
        )}
      </Group>
      {!ready && (
        <>
          <Text size="sm" c="dimmed">
            {t('page.account.payout.why')}
          </Text>
          <Group align="flex-end">
            {!a.linked && (
              <NativeSelect
                label={t('page.account.payout.country')}
                data={countryOptions(i18next.language)}
                value={country}
                onChange={(e) => setCountry(e.currentTarget.value)}
              />
            )}
            <Button variant="light" loading={create.isPending} onClick={() => void start().catch(() => undefined)}>
              {t(a.linked ? 'page.account.payout.finish' : 'page.account.payout.start')}
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
