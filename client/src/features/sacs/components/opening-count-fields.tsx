import { Checkbox, SimpleGrid } from '@mantine/core';
import type { UseFormReturnType } from '@mantine/form';
import { TEXT_LIMITS } from '@broodsilk/shared';
import { NumberField } from '@/components/fields/number-field';
import { TextAreaField } from '@/components/fields/text-field';
import { useWords } from '@/lib/i18n';
import { countFields, type OpeningValues } from '../utils/opening-values';

/** The opening's counts, the estimate switch and the notes: the same fields for a first opening and a correction. */
export function OpeningCountFields({ form }: { form: UseFormReturnType<OpeningValues> }) {
  const t = useWords();
  return (
    <>
      <SimpleGrid cols={{ base: 2, sm: 3 }}>
        {countFields().map(([k, label]) => (
          <NumberField key={form.key(k)} label={label} whole {...form.getInputProps(k)} />
        ))}
      </SimpleGrid>
      <Checkbox
        label={t('page.sacs.opening.estimated')}
        description={t('page.sacs.opening.estimatedHint')}
        key={form.key('estimated')}
        {...form.getInputProps('estimated', { type: 'checkbox' })}
      />
      <TextAreaField label={t('page.sacs.notes')} maxLength={TEXT_LIMITS.note} key={form.key('notes')} {...form.getInputProps('notes')} />
    </>
  );
}
