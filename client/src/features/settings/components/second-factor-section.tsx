import { Alert, Stack, Text } from '@mantine/core';
import { useState } from 'react';
import type { TotpEnrolment } from '@broodsilk/shared';
import { FormActions } from '@/components/ui/form-actions';
import { errorMessage } from '@/lib/form-errors';
import { useSecondFactorStatus, useStartEnrolment } from '../api/second-factor';
import { EnrolSecondFactor } from './enrol-second-factor';
import { RecoveryCodes } from './recovery-codes';
import { RemoveSecondFactorForm } from './remove-second-factor-form';
import { RenewRecoveryCodes } from './renew-recovery-codes';
import { useWords } from '@/lib/i18n';

/** Sign-in security: set up or remove a TOTP second factor. */
export function SecondFactorSection() {
  const status = useSecondFactorStatus();
  const start = useStartEnrolment();
  const [enrolment, setEnrolment] = useState<TotpEnrolment | null>(null);
  const [codes, setCodes] = useState<string[] | null>(null);
  const [renewed, setRenewed] = useState<string[] | null>(null);
  const t = useWords();

  if (codes) return <RecoveryCodes codes={codes} onDone={() => setCodes(null)} />;
  if (renewed) {
    const notice = { title: t('page.settings.renewCodes.doneTitle'), body: t('page.settings.renewCodes.doneBody') };
    return <RecoveryCodes codes={renewed} notice={notice} onDone={() => setRenewed(null)} />;
  }
  if (!status.data) return null;
  if (enrolment) {
    return (
      <EnrolSecondFactor
        enrolment={enrolment}
        onEnrolled={(c) => {
          setEnrolment(null);
          setCodes(c);
        }}
        onCancel={() => setEnrolment(null)}
      />
    );
  }
  if (status.data.enabled) {
    return (
      <Stack>
        <Text>Signing in asks for a code from your authenticator app. Recovery codes left: {status.data.recoveryCodesLeft} of 10.</Text>
        {status.data.required ? (
          <Alert color="clay">Administrators must keep a second factor. If you remove it, administrator pages stay closed until you set one up again.</Alert>
        ) : null}
        <RenewRecoveryCodes onRenewed={setRenewed} />
        <RemoveSecondFactorForm />
      </Stack>
    );
  }
  return (
    <form
      onSubmit={(e) => {
        e.preventDefault();
        start.mutate(undefined, { onSuccess: setEnrolment });
      }}
    >
      <Stack maw={480}>
        {status.data.required ? (
          <Alert color="clay" title="Second factor required">
            Your account is an administrator account. Set up a second factor before using administrator pages.
          </Alert>
        ) : null}
        <Text>Add a second step to signing in: a six-digit code from an authenticator app on your phone, so a stolen password alone is not enough.</Text>
        <FormActions message={start.error ? errorMessage(start.error) : null} loading={start.isPending} submitLabel="Set up an authenticator app" />
      </Stack>
    </form>
  );
}
