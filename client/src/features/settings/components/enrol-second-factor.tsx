import { Code, Image, Stack, Text } from '@mantine/core';
import { useForm } from '@mantine/form';
import { useState } from 'react';
import type { TotpEnrolment } from '@broodsilk/shared';
import { FormActions } from '@/components/ui/form-actions';
import { applyServerErrors } from '@/lib/form-errors';
import { useConfirmEnrolment } from '../api/second-factor';
import { CodeAndPasswordFields, codeAndPasswordRules, type CodeAndPassword } from './second-factor-fields';
import { useWords } from '@/lib/i18n';

/** The new secret as a QR code and as text (shown this once), then the first code and the password to turn it on. */
export function EnrolSecondFactor({
  enrolment,
  onEnrolled,
  onCancel,
}: {
  enrolment: TotpEnrolment;
  onEnrolled: (codes: string[]) => void;
  onCancel: () => void;
}) {
  const t = useWords();
  const confirm = useConfirmEnrolment();
  const [problem, setProblem] = useState<string | null>(null);
  const form = useForm<CodeAndPassword>({
    mode: 'uncontrolled',
    validateInputOnBlur: true,
    initialValues: { code: '', password: '' },
    validate: codeAndPasswordRules(t, t('page.settings.secondFactor.enterSixDigits')),
  });
  return (
    <form
      onSubmit={form.onSubmit((values) => {
        setProblem(null);
        confirm.mutate(values, { onSuccess: (res) => onEnrolled(res.recoveryCodes), onError: (e) => setProblem(applyServerErrors(form, e)) });
      })}
    >
      <Stack maw={480}>
        <Text>{t('page.settings.secondFactor.scan')}</Text>
        <Image src={enrolment.qrCode} alt={t('page.settings.secondFactor.qrAlt')} w={200} h={200} bg="white" />
        <Text size="sm">
          {t('page.settings.secondFactor.key')} <Code data-testid="totp-secret">{enrolment.secret}</Code>
        </Text>
        <CodeAndPasswordFields form={form} codeLabel={t('page.settings.secondFactor.code')} codeDescription={t('page.settings.secondFactor.codeHint')} />
        <FormActions message={problem} loading={confirm.isPending} submitLabel={t('page.settings.secondFactor.turnOn')} onCancel={onCancel} />
      </Stack>
    </form>
  );
}
