import { Anchor, Stack, Text } from '@mantine/core';
import { useForm } from '@mantine/form';
import { useState } from 'react';
import { TEXT_LIMITS, type SecondFactorChallenge } from '@broodsilk/shared';
import { TextField } from '@/components/fields/text-field';
import { textRule } from '@/components/fields/text-rule';
import { FormActions } from '@/components/ui/form-actions';
import { applyServerErrors } from '@/lib/form-errors';
import { useSecondFactorSignIn } from '../api/session';
import { useWords } from '@/lib/i18n';

/** The second step of signing in: the code from the authenticator app, or one recovery code. */
export function SecondFactorStep({
  challenge,
  onSignedIn,
  onStartAgain,
}: {
  challenge: SecondFactorChallenge;
  onSignedIn: () => void;
  onStartAgain: () => void;
}) {
  const t = useWords();
  const complete = useSecondFactorSignIn();
  const [problem, setProblem] = useState<string | null>(null);
  const form = useForm({
    mode: 'uncontrolled',
    validateInputOnBlur: true,
    initialValues: { code: '' },
    validate: { code: textRule({ required: t('page.auth.codeRequired'), maxLength: TEXT_LIMITS.secondFactorCode }) },
  });
  return (
    <form
      onSubmit={form.onSubmit(({ code }) => {
        setProblem(null);
        complete.mutate({ pendingToken: challenge.pendingToken, code }, { onSuccess: onSignedIn, onError: (e) => setProblem(applyServerErrors(form, e)) });
      })}
    >
      <Stack>
        <Text>{t('page.auth.codeText')}</Text>
        <TextField
          label={t('page.auth.code')}
          description={t('page.auth.codeHint')}
          autoComplete="one-time-code"
          withAsterisk
          data-autofocus
          maxLength={TEXT_LIMITS.secondFactorCode}
          key={form.key('code')}
          {...form.getInputProps('code')}
        />
        <FormActions message={problem} loading={complete.isPending} submitLabel={t('page.auth.signIn')} />
        <Text size="sm">
          <Anchor component="button" type="button" onClick={onStartAgain}>
            {t('page.auth.startAgain')}
          </Anchor>
        </Text>
      </Stack>
    </form>
  );
}
