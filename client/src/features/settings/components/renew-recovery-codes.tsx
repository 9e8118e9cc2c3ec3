import { Button, PasswordInput, Stack, Text } from '@mantine/core';
import { useForm } from '@mantine/form';
import { useState } from 'react';
import { TEXT_LIMITS } from '@broodsilk/shared';
import { TextField } from '@/components/fields/text-field';
import { textRule } from '@/components/fields/text-rule';
import { FormActions } from '@/components/ui/form-actions';
import { applyServerErrors } from '@/lib/form-errors';
import { useWords } from '@/lib/i18n';
import { useRenewRecoveryCodes } from '../api/second-factor';

/** "Make new recovery codes": the password or the app's current code, then the new codes replace the old ones. */
export function RenewRecoveryCodes({ onRenewed }: { onRenewed: (codes: string[]) => void }) {
  const t = useWords();
  const renew = useRenewRecoveryCodes();
  const [open, setOpen] = useState(false);
  const [problem, setProblem] = useState<string | null>(null);
  const form = useForm({
    mode: 'uncontrolled',
    validateInputOnBlur: true,
    initialValues: { password: '', code: '' },
    validate: {
      password: (v, values) => (!v && !values.code.trim() ? t('page.settings.renewCodes.needOne') : textRule({ maxLength: TEXT_LIMITS.password })(v)),
      code: textRule({ maxLength: TEXT_LIMITS.secondFactorCode }),
    },
  });

  if (!open) {
    return (
      <Button variant="default" w="fit-content" onClick={() => setOpen(true)}>
        {t('page.settings.renewCodes.open')}
      </Button>
    );
  }
  return (
    <form
      onSubmit={form.onSubmit(({ password, code }) => {
        setProblem(null);
        renew.mutate(password ? { password } : { code: code.trim() }, {
          onSuccess: (res) => onRenewed(res.recoveryCodes),
          onError: (e) => setProblem(applyServerErrors(form, e)),
        });
      })}
    >
      <Stack maw={480}>
        <Text>{t('page.settings.renewCodes.intro')}</Text>
        <PasswordInput
          label={t('page.settings.renewCodes.password')}
          autoComplete="current-password"
          key={form.key('password')}
          {...form.getInputProps('password')}
        />
        <TextField
          label={t('page.settings.renewCodes.code')}
          autoComplete="one-time-code"
          maxLength={TEXT_LIMITS.secondFactorCode}
          key={form.key('code')}
          {...form.getInputProps('code')}
        />
        <FormActions
          message={problem}
          loading={renew.isPending}
          submitLabel={t('page.settings.renewCodes.submit')}
          onCancel={() => setOpen(false)}
          cancelLabel={t('page.settings.renewCodes.cancel')}
        />
      </Stack>
    </form>
  );
}
