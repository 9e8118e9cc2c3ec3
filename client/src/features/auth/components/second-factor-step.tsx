import { Anchor, Stack, Text } from '@mantine/core';
import { useForm } from '@mantine/form';
import { useState } from 'react';
import { TEXT_LIMITS, type SecondFactorChallenge } from '@broodsilk/shared';
import { TextField } from '@/components/fields/text-field';
import { textRule } from '@/components/fields/text-rule';
import { FormActions } from '@/components/ui/form-actions';
import { applyServerErrors } from '@/lib/form-errors';
import { useSecondFactorSignIn } from '../api/session';

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
  const complete = useSecondFactorSignIn();
  const [problem, setProblem] = useState<string | null>(null);
  const form = useForm({
    mode: 'uncontrolled',
    validateInputOnBlur: true,
    initialValues: { code: '' },
    validate: { code: textRule({ required: 'Enter the code your app shows, or a recovery code.', maxLength: TEXT_LIMITS.secondFactorCode }) },
  });
  return (
    <form
      onSubmit={form.onSubmit(({ code }) => {
        setProblem(null);
        complete.mutate({ pendingToken: challenge.pendingToken, code }, { onSuccess: onSignedIn, onError: (e) => setProblem(applyServerErrors(form, e)) });
      })}
    >
      <Stack>
        <Text>Your password is right. Now enter the six-digit code your authenticator app shows for Broodsilk.</Text>
        <TextField
          label="Code"
          description="Lost your phone? Enter one of your recovery codes instead."
          autoComplete="one-time-code"
          withAsterisk
          data-autofocus
          maxLength={TEXT_LIMITS.secondFactorCode}
          key={form.key('code')}
          {...form.getInputProps('code')}
        />
        <FormActions message={problem} loading={complete.isPending} submitLabel="Sign in" />
        <Text size="sm">
          <Anchor component="button" type="button" onClick={onStartAgain}>
            Start again with your e-mail and password
          </Anchor>
        </Text>
      </Stack>
    </form>
  );
}
