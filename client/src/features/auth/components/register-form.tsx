import { Alert, Button, PasswordInput, Stack, TextInput } from '@mantine/core';
import { useForm } from '@mantine/form';
import { useState } from 'react';
import { MIN_PASSWORD_LENGTH } from '@broodsilk/shared';
import { applyServerErrors } from '@/lib/form-errors';
import { useRegister } from '../api/session';

export function RegisterForm({ onRegistered }: { onRegistered: () => void }) {
  const register = useRegister();
  const [problem, setProblem] = useState<string | null>(null);
  const form = useForm({
    mode: 'uncontrolled',
    initialValues: { displayName: '', email: '', password: '' },
    validate: {
      displayName: (v) => (v.trim() ? null : 'Tell us the name to show to your partners.'),
      email: (v) => (/^\S+@\S+\.\S+$/.test(v.trim()) ? null : 'Enter a valid e-mail address.'),
      password: (v) => (v.length >= MIN_PASSWORD_LENGTH ? null : `Use a password of at least ${MIN_PASSWORD_LENGTH} characters.`),
    },
  });

  return (
    <form
      onSubmit={form.onSubmit((values) => {
        setProblem(null);
        const timeZone = Intl.DateTimeFormat().resolvedOptions().timeZone;
        register.mutate({ ...values, timeZone }, { onSuccess: onRegistered, onError: (e) => setProblem(applyServerErrors(form, e)) });
      })}
    >
      <Stack>
        {problem && (
          <Alert color="clay" variant="light" role="alert">
            {problem}
          </Alert>
        )}
        <TextInput label="Your name" description="Shown to your partners" withAsterisk key={form.key('displayName')} {...form.getInputProps('displayName')} />
        <TextInput label="E-mail" type="email" autoComplete="email" withAsterisk key={form.key('email')} {...form.getInputProps('email')} />
        <PasswordInput
          label="Password"
          description={`At least ${MIN_PASSWORD_LENGTH} characters`}
          autoComplete="new-password"
          required
          key={form.key('password')}
          {...form.getInputProps('password')}
        />
        <Button type="submit" loading={register.isPending}>
          Create account
        </Button>
      </Stack>
    </form>
  );
}
