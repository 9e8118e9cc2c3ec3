import { Anchor, PasswordInput, Stack, Text, TextInput } from '@mantine/core';
import { FormActions } from '@/components/ui/form-actions';
import { useForm } from '@mantine/form';
import { useState } from 'react';
import { Link } from 'react-router';
import { applyServerErrors } from '@/lib/form-errors';
import { paths } from '@/config/paths';
import { EMAIL_NOT_CONFIRMED, needsSecondFactor, type SecondFactorChallenge } from '@broodsilk/shared';
import { isApiError } from '@/lib/api-error';
import { useWords } from '@/lib/i18n';
import { useLogin } from '../api/session';
import { SecondFactorStep } from './second-factor-step';
import { ResendConfirmation } from './resend-confirmation';

/** `registerHref` lets the sign-in page keep where the user was going (e.g. an invitation) when they register instead. */
export function SignInForm({ onSignedIn, registerHref = paths.register.href() }: { onSignedIn: () => void; registerHref?: string }) {
  const t = useWords();
  const login = useLogin();
  const [problem, setProblem] = useState<string | null>(null);
  /** The address whose right password was refused until it is confirmed. */
  const [unconfirmed, setUnconfirmed] = useState<string | null>(null);
  const [challenge, setChallenge] = useState<SecondFactorChallenge | null>(null);
  const form = useForm({
    mode: 'uncontrolled',
    initialValues: { email: '', password: '' },
    validate: {
      email: (v) => (/^\S+@\S+\.\S+$/.test(v.trim()) ? null : t('page.auth.enterEmail')),
      password: (v) => (v ? null : t('page.auth.enterPassword')),
    },
  });

  if (challenge) return <SecondFactorStep challenge={challenge} onSignedIn={onSignedIn} onStartAgain={() => setChallenge(null)} />;

  return (
    <form
      onSubmit={form.onSubmit((values) => {
        setProblem(null);
        setUnconfirmed(null);
        login.mutate(values, {
          onSuccess: (res) => (needsSecondFactor(res) ? setChallenge(res) : onSignedIn()),
          onError: (e) => {
            if (isApiError(e) && e.reason === EMAIL_NOT_CONFIRMED) {
              setUnconfirmed(values.email.trim());
              setProblem(t('page.auth.notConfirmed'));
            } else setProblem(applyServerErrors(form, e));
          },
        });
      })}
    >
      <Stack>
        <TextInput label={t('page.auth.email')} type="email" autoComplete="email" withAsterisk key={form.key('email')} {...form.getInputProps('email')} />
        <PasswordInput
          label={t('page.auth.password')}
          autoComplete="current-password"
          withAsterisk
          key={form.key('password')}
          {...form.getInputProps('password')}
        />
        <FormActions message={problem} loading={login.isPending} submitLabel={t('page.auth.signIn')} />
        {unconfirmed ? <ResendConfirmation email={unconfirmed} /> : null}
        <Text size="sm">
          <Anchor component={Link} to={paths.forgotPassword.href()}>
            {t('page.auth.forgot')}
          </Anchor>{' '}
          · {t('page.auth.newHere')}{' '}
          <Anchor component={Link} to={registerHref}>
            {t('page.auth.createAccount')}
          </Anchor>
        </Text>
      </Stack>
    </form>
  );
}
