import { Code, Image, Stack, Text } from '@mantine/core';
import { useForm } from '@mantine/form';
import { useState } from 'react';
import type { TotpEnrolment } from '@broodsilk/shared';
import { FormActions } from '@/components/ui/form-actions';
import { applyServerErrors } from '@/lib/form-errors';
import { useConfirmEnrolment } from '../api/second-factor';
import { CodeAndPasswordFields, codeAndPasswordRules, type CodeAndPassword } from './second-factor-fields';

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
  const confirm = useConfirmEnrolment();
  const [problem, setProblem] = useState<string | null>(null);
  const form = useForm<CodeAndPassword>({
    mode: 'uncontrolled',
    validateInputOnBlur: true,
    initialValues: { code: '', password: '' },
    validate: codeAndPasswordRules('Enter the six digits your app shows.'),
  });
  return (
    <form
      onSubmit={form.onSubmit((values) => {
        setProblem(null);
        confirm.mutate(values, { onSuccess: (res) => onEnrolled(res.recoveryCodes), onError: (e) => setProblem(applyServerErrors(form, e)) });
      })}
    >
      <Stack maw={480}>
        <Text>Scan this code with an authenticator app on your phone, or type the key below into it.</Text>
        <Image src={enrolment.qrCode} alt="QR code holding the key for your authenticator app" w={200} h={200} bg="white" />
        <Text size="sm">
          Key: <Code data-testid="totp-secret">{enrolment.secret}</Code>
        </Text>
        <CodeAndPasswordFields form={form} codeLabel="Code from the app" codeDescription="Six digits; the app shows a new one every 30 seconds." />
        <FormActions message={problem} loading={confirm.isPending} submitLabel="Turn on" onCancel={onCancel} />
      </Stack>
    </form>
  );
}
