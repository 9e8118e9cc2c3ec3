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
import { RECOVERY_CODE_COUNT } from '@broodsilk/shared';

/** Sign-in security: set up or remove a TOTP second factor. */
export function SecondFactorSection() {
  const t = useWords();
  const status = useSecondFactorStatus();
  const start = useStartEnrolment();
  const [enrolment, setEnrolment] = useState<TotpEnrolment | null>(null);
  const [codes, setCodes] = useState<string[] | null>(null);
  const [renewed, setRenewed] = useState<string[] | null>(null);

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
        <Text>{t('page.settings.secondFactor.enabled', { left: status.data.recoveryCodesLeft, total: RECOVERY_CODE_COUNT })}</Text>
        {status.data.required ? <Alert color="clay">{t('page.settings.secondFactor.adminKeep')}</Alert> : null}
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
          <Alert color="clay" title={t('page.settings.secondFactor.requiredTitle')}>
            {t('page.settings.secondFactor.requiredText')}
          </Alert>
        ) : null}
        <Text>{t('page.settings.secondFactor.offText')}</Text>
        <FormActions message={start.error ? errorMessage(start.error) : null} loading={start.isPending} submitLabel={t('page.settings.secondFactor.setUp')} />
      </Stack>
    </form>
  );
}
