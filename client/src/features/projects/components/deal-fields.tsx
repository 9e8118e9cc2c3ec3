import { Select, SimpleGrid } from '@mantine/core';
import type { ReactNode } from 'react';
import type { BoundField } from '@/components/fields/bound-field';
import { NumberField } from '@/components/fields/number-field';
import { BROOD_STAGES, broodStageLabel, FAILURE_CLAUSES, SHIPPING_PAYERS } from '@broodsilk/shared';
import { currentNumbering, useWords, words } from '@/lib/i18n';
import { FAILURE_CLAUSE_LABELS, SHIPPING_LABELS } from '../utils/labels';

export const CURRENCIES = ['EUR', 'USD', 'GBP', 'PLN', 'CHF', 'CZK', 'SEK', 'CAD', 'AUD'];
// Functions, not constants: the words follow the reader's language and stage numbering.
export const failureOptions = () => FAILURE_CLAUSES.map((c) => ({ value: c, label: FAILURE_CLAUSE_LABELS[c] }));
export const shippingOptions = () => SHIPPING_PAYERS.map((s) => ({ value: s, label: SHIPPING_LABELS[s] }));
export const handOverOptions = () => BROOD_STAGES.map((s) => ({ value: s, label: broodStageLabel(words, s, currentNumbering()) }));

export type DealFieldName = 'price' | 'currency' | 'failureClause' | 'handOverStage' | 'shippingPaidBy';

export interface DealFieldsProps {
  /** The form's binding of each field: `(name) => ({ key: form.key(name), ...form.getInputProps(name) })`. */
  field: (name: DealFieldName) => BoundField;
  /** Further fields in the same grid (a note to partners). */
  children?: ReactNode;
}

/** The project-wide part of the terms: price and currency, the failure clause, the hand-over stage and who pays shipping. */
export function DealFields({ field, children }: DealFieldsProps) {
  const t = useWords();
  const select = ({ key, ...props }: BoundField, label: string, data: { value: string; label: string }[] | string[]) => (
    <Select label={label} data={data} allowDeselect={false} key={key} {...props} />
  );
  const { key: priceKey, ...priceProps } = field('price');
  const { key: currencyKey, ...currencyProps } = field('currency');
  return (
    <SimpleGrid cols={{ base: 1, sm: 3 }}>
      <NumberField label={t('page.projects.deal.price')} key={priceKey} {...priceProps} />
      <Select label={t('page.projects.deal.currency')} data={CURRENCIES} searchable allowDeselect={false} key={currencyKey} {...currencyProps} />
      {select(field('failureClause'), t('page.projects.deal.failureClause'), failureOptions())}
      {select(field('handOverStage'), t('page.projects.deal.handOver'), handOverOptions())}
      {select(field('shippingPaidBy'), t('page.projects.deal.shipping'), shippingOptions())}
      {children}
    </SimpleGrid>
  );
}
