import { Group, NativeSelect } from '@mantine/core';
import type { SacSharesView } from '@broodsilk/shared';
import type { BoundField } from '@/components/fields/bound-field';
import { DateField } from '@/components/fields/date-field';
import { NumberField } from '@/components/fields/number-field';
import { formatDate } from '@/lib/dates';

/** Which sac the young leave (asked only when more than one has young in care), how many, and on which day. */
export function SacCountDateFields({ withYoung, sac, count, date }: { withYoung: SacSharesView[]; sac: BoundField; count: BoundField; date: BoundField }) {
  const { key: sacKey, ...sacProps } = sac;
  const { key: countKey, ...countProps } = count;
  const { key: dateKey, ...dateProps } = date;
  return (
    <>
      {withYoung.length > 1 && (
        <NativeSelect
          label="From the sac"
          data={[
            { value: '', label: 'Choose a sac' },
            ...withYoung.map((s) => ({ value: s.sacId, label: `Laid ${formatDate(s.layDate)} (${s.aliveInCare} in care)` })),
          ]}
          key={sacKey}
          {...sacProps}
        />
      )}
      <Group grow align="flex-start">
        <NumberField label="Count" whole withAsterisk key={countKey} {...countProps} />
        <DateField label="Date" withAsterisk key={dateKey} {...dateProps} />
      </Group>
    </>
  );
}
