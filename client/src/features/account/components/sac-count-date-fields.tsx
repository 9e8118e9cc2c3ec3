import { Group, NativeSelect } from '@mantine/core';
import type { SacSharesView, Words } from '@broodsilk/shared';
import type { BoundField } from '@/components/fields/bound-field';
import { DateField } from '@/components/fields/date-field';
import { NumberField } from '@/components/fields/number-field';
import { dateRule } from '@/components/fields/typed-date';
import { numberRule } from '@/components/fields/typed-number';
import { useWords } from '@/lib/i18n';

/** The count of young leaving a share: a whole number from 1 to 100,000. */
export const countRule = (t: Words) =>
  numberRule({ required: t('page.account.form.howMany'), min: 1, max: 100_000, decimals: 0, rangeMessage: t('page.account.form.countRange') });

/** The day something happened: required and not after today. */
export const pastDateRule = (t: Words, today: string) =>
  dateRule({ required: t('page.account.form.giveDate'), latest: today, latestMessage: t('page.shell.fields.notAfterToday') });

/** Which sac the young leave (asked only when more than one has young in care), how many, and on which day. */
export function SacCountDateFields({ withYoung, sac, count, date }: { withYoung: SacSharesView[]; sac: BoundField; count: BoundField; date: BoundField }) {
  const t = useWords();
  const { key: sacKey, ...sacProps } = sac;
  const { key: countKey, ...countProps } = count;
  const { key: dateKey, ...dateProps } = date;
  return (
    <>
      {withYoung.length > 1 && (
        <NativeSelect
          label={t('page.account.form.fromSac')}
          data={[
            { value: '', label: t('page.account.form.chooseSac') },
            ...withYoung.map((s) => ({ value: s.sacId, label: t('page.account.form.sacOption', { date: s.layDate, inCare: s.aliveInCare }) })),
          ]}
          key={sacKey}
          {...sacProps}
        />
      )}
      <Group grow align="flex-start">
        <NumberField label={t('page.account.form.count')} whole withAsterisk key={countKey} {...countProps} />
        <DateField label={t('page.account.form.date')} withAsterisk key={dateKey} {...dateProps} />
      </Group>
    </>
  );
}
