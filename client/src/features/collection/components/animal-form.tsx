import { Fieldset, SegmentedControl, Select, SimpleGrid, Stack, Text } from '@mantine/core';
import { useForm } from '@mantine/form';
import { Fragment, useState, type ReactNode } from 'react';
import { ANIMAL_SEXES, ANIMAL_STATUSES, CUSTODIES, MATURITIES, OWNER_KINDS, TEXT_LIMITS, minorDigits, type AnimalResponse } from '@broodsilk/shared';
import { DateField } from '@/components/fields/date-field';
import { NumberField } from '@/components/fields/number-field';
import { TextAreaField, TextField } from '@/components/fields/text-field';
import { textRule } from '@/components/fields/text-rule';
import { checkDate, deviceToday } from '@/components/fields/typed-date';
import { checkNumber } from '@/components/fields/typed-number';
import { FormActions } from '@/components/ui/form-actions';
import { applyServerErrors } from '@/lib/form-errors';
import { useWords } from '@/lib/i18n';
import { useCreateAnimal, useUpdateAnimal } from '../api/animals';
import { animalFormValues, toAnimalRequest, type AnimalFormValues } from '../utils/animal-form-values';
import { CUSTODY_LABELS, MATURITY_LABELS, OWNER_LABELS, SEX_LABELS, STATUS_LABELS } from '../utils/animal-view';

/** What the form hands to the species picker the app layer plugs in. */
export interface SpeciesFieldProps {
  defaultValue?: string | null;
  defaultName?: string | null;
  onChange?: (speciesId: string | null) => void;
  error?: ReactNode;
  withAsterisk?: boolean;
}

/** Server field names that differ from the form's. */
const SERVER_FIELDS: Record<string, keyof AnimalFormValues> = { pricePaidMinor: 'price' };

interface AnimalFormProps {
  animal?: AnimalResponse;
  /** The species picker, supplied by the app layer (it belongs to the species feature). */
  renderSpeciesPicker: (props: SpeciesFieldProps) => ReactNode;
  onSaved: (animal: AnimalResponse) => void;
  onCancel?: () => void;
}

type Shape = Pick<AnimalFormValues, 'sex' | 'maturity' | 'ownerKind' | 'custody' | 'status'>;

export function AnimalForm({ animal, renderSpeciesPicker, onSaved, onCancel }: AnimalFormProps) {
  const t = useWords();
  const notInFuture = t('page.shell.fields.notAfterToday');
  const create = useCreateAnimal();
  const update = useUpdateAnimal(animal?.id ?? '');
  const save = animal ? update : create;
  const [message, setMessage] = useState<string | null>(null);
  const start = animalFormValues(animal);
  const today = deviceToday();
  const [shape, setShape] = useState<Shape>({
    sex: start.sex,
    maturity: start.maturity,
    ownerKind: start.ownerKind,
    custody: start.custody,
    status: start.status,
  });

  const form = useForm<AnimalFormValues>({
    mode: 'uncontrolled',
    validateInputOnBlur: true,
    initialValues: start,
    onValuesChange: (v) =>
      setShape((s) =>
        s.sex === v.sex && s.maturity === v.maturity && s.ownerKind === v.ownerKind && s.custody === v.custody && s.status === v.status
          ? s
          : { sex: v.sex, maturity: v.maturity, ownerKind: v.ownerKind, custody: v.custody, status: v.status },
      ),
    validate: {
      speciesId: (v) => (v ? null : t('page.collection.form.chooseSpecies')),
      label: textRule({ required: t('page.collection.form.labelMissing'), maxLength: TEXT_LIMITS.animalLabel }),
      enclosure: textRule({ maxLength: TEXT_LIMITS.enclosure }),
      maturedOn: (v, all) =>
        checkDate(v, {
          required: all.sex === 'male' && all.maturity === 'mature' ? t('page.collection.form.matureMaleNeedsDate') : undefined,
          latest: today,
          latestMessage: notInFuture,
        }),
      acquiredOn: (v) => checkDate(v, { latest: today, latestMessage: notInFuture }),
      acquiredFrom: textRule({ maxLength: TEXT_LIMITS.acquiredFrom }),
      price: (v, all) =>
        checkNumber(v, {
          min: 0,
          max: 1_000_000,
          decimals: minorDigits(all.priceCurrency.trim().toUpperCase() || 'EUR'),
          rangeMessage: t('page.collection.form.priceRange'),
        }),
      priceCurrency: (v, all) => (all.price.trim() !== '' && !v.trim() ? t('page.collection.form.currencyMissing') : null),
      custodyParty: textRule({ maxLength: TEXT_LIMITS.personName }),
      dueBackOn: (v) => checkDate(v),
      notes: textRule({ maxLength: TEXT_LIMITS.animalNotes }),
      premoltNote: textRule({ maxLength: TEXT_LIMITS.premoltNote }),
      ownerEmail: (v, all) =>
        all.ownerKind === 'keeper' && !v.trim() && animal?.owner.kind !== 'keeper' ? t('page.collection.form.keeperEmailMissing') : null,
      ownerName: (v, all) => (all.ownerKind === 'party' && !v.trim() ? t('page.collection.form.ownerNameMissing') : null),
      statusOn: (v, all) =>
        checkDate(v, {
          required:
            all.status === 'sold' || all.status === 'deceased'
              ? t(all.status === 'sold' ? 'page.collection.form.soldOnMissing' : 'page.collection.form.diedOnMissing')
              : undefined,
          latest: today,
          latestMessage: notInFuture,
        }),
    },
  });

  const serverErrors = {
    setErrors: (errors: Record<string, string>) => form.setErrors(Object.fromEntries(Object.entries(errors).map(([k, m]) => [SERVER_FIELDS[k] ?? k, m]))),
  };

  const submit = form.onSubmit((values) => {
    setMessage(null);
    save.mutate(toAnimalRequest(values), {
      onSuccess: onSaved,
      onError: (e) => setMessage(applyServerErrors(serverErrors, e)),
    });
  });

  const matureMale = shape.sex === 'male' && shape.maturity === 'mature';
  const loan = shape.custody !== 'with-owner';

  return (
    <form onSubmit={submit} noValidate aria-label={t(animal ? 'page.collection.form.editName' : 'page.collection.form.addName')}>
      <Stack>
        <Fragment key={form.key('speciesId')}>
          {renderSpeciesPicker({ ...form.getInputProps('speciesId'), defaultName: animal?.species.scientificName ?? null, withAsterisk: true })}
        </Fragment>
        <SimpleGrid cols={{ base: 1, sm: 2 }}>
          <TextField
            label={t('page.collection.form.label')}
            description={t('page.collection.form.labelHint')}
            withAsterisk
            maxLength={TEXT_LIMITS.animalLabel}
            key={form.key('label')}
            {...form.getInputProps('label')}
          />
          <TextField
            label={t('page.collection.form.enclosure')}
            maxLength={TEXT_LIMITS.enclosure}
            key={form.key('enclosure')}
            {...form.getInputProps('enclosure')}
          />
        </SimpleGrid>
        <SimpleGrid cols={{ base: 1, sm: 2 }}>
          <Stack gap={4}>
            <Text size="sm" fw={500} id="animal-sex-label">
              {t('page.collection.form.sex')}
            </Text>
            <SegmentedControl
              aria-labelledby="animal-sex-label"
              fullWidth
              data={ANIMAL_SEXES.map((s) => ({ value: s, label: SEX_LABELS[s] }))}
              key={form.key('sex')}
              {...form.getInputProps('sex')}
            />
          </Stack>
          <Stack gap={4}>
            <Text size="sm" fw={500} id="animal-maturity-label">
              {t('page.collection.form.maturity')}
            </Text>
            <SegmentedControl
              aria-labelledby="animal-maturity-label"
              fullWidth
              data={MATURITIES.map((m) => ({ value: m, label: MATURITY_LABELS[m] }))}
              key={form.key('maturity')}
              {...form.getInputProps('maturity')}
            />
          </Stack>
        </SimpleGrid>
        {shape.maturity === 'mature' && (
          <DateField
            label={t('page.collection.form.maturingMolt')}
            description={t(matureMale ? 'page.collection.form.maturingMoltMale' : 'page.collection.form.maturingMoltFemale')}
            withAsterisk={matureMale}

            key={form.key('maturedOn')}
            {...form.getInputProps('maturedOn')}
          />
        )}
        {shape.sex === 'female' && (
          <TextAreaField
            maxLength={TEXT_LIMITS.premoltNote}
            label={t('page.collection.form.premoltNote')}
            description={t('page.collection.form.premoltNoteHint')}
            rows={2}
            key={form.key('premoltNote')}
            {...form.getInputProps('premoltNote')}
          />
        )}

        <Fieldset legend={t('page.collection.form.acquisition')}>
          <SimpleGrid cols={{ base: 1, sm: 2 }}>
            <DateField
              label={t('page.collection.form.acquiredOn')}

              key={form.key('acquiredOn')}
              {...form.getInputProps('acquiredOn')}
            />
            <TextField
              label={t('page.collection.form.acquiredFrom')}
              maxLength={TEXT_LIMITS.acquiredFrom}
              key={form.key('acquiredFrom')}
              {...form.getInputProps('acquiredFrom')}
            />
            <NumberField label={t('page.collection.form.pricePaid')} key={form.key('price')} {...form.getInputProps('price')} />
            <TextField
              label={t('page.collection.form.currency')}
              placeholder="EUR"
              maxLength={3}
              key={form.key('priceCurrency')}
              {...form.getInputProps('priceCurrency')}
            />
          </SimpleGrid>
        </Fieldset>

        <Fieldset legend={t('page.collection.form.ownerAndCustody')}>
          <Stack>
            <Select
              label={t('page.collection.form.owner')}
              allowDeselect={false}
              data={OWNER_KINDS.map((k) => ({ value: k, label: OWNER_LABELS[k] }))}
              key={form.key('ownerKind')}
              {...form.getInputProps('ownerKind')}
            />
            {shape.ownerKind === 'keeper' && (
              <TextField
                label={t('page.collection.form.ownerEmail')}
                maxLength={TEXT_LIMITS.email}
                description={
                  animal?.owner.kind === 'keeper'
                    ? t('page.collection.form.ownerEmailNow', { name: animal.owner.name })
                    : t('page.collection.form.ownerEmailHint')
                }
                type="email"
                withAsterisk={animal?.owner.kind !== 'keeper'}
                key={form.key('ownerEmail')}
                {...form.getInputProps('ownerEmail')}
              />
            )}
            {shape.ownerKind === 'party' && (
              <SimpleGrid cols={{ base: 1, sm: 2 }}>
                <TextField
                  label={t('page.collection.form.ownerName')}
                  withAsterisk
                  maxLength={TEXT_LIMITS.personName}
                  key={form.key('ownerName')}
                  {...form.getInputProps('ownerName')}
                />
                <TextField
                  label={t('page.collection.form.ownerEmail')}
                  type="email"
                  maxLength={TEXT_LIMITS.email}
                  key={form.key('ownerEmail')}
                  {...form.getInputProps('ownerEmail')}
                />
              </SimpleGrid>
            )}
            <Select
              label={t('page.collection.form.custody')}
              allowDeselect={false}
              data={CUSTODIES.map((c) => ({ value: c, label: CUSTODY_LABELS[c] }))}
              key={form.key('custody')}
              {...form.getInputProps('custody')}
            />
            {loan && (
              <SimpleGrid cols={{ base: 1, sm: 2 }}>
                <TextField
                  maxLength={TEXT_LIMITS.personName}
                  label={t(shape.custody === 'loan-in' ? 'page.collection.form.lentToMeBy' : 'page.collection.form.heldBy')}
                  description={shape.custody === 'loan-in' ? t('page.collection.form.lentToMeByHint') : undefined}
                  withAsterisk={shape.custody === 'loan-out'}
                  key={form.key('custodyParty')}
                  {...form.getInputProps('custodyParty')}
                />
                <DateField
                  label={t('page.collection.form.dueBackOn')}

                  key={form.key('dueBackOn')}
                  {...form.getInputProps('dueBackOn')}
                />
              </SimpleGrid>
            )}
          </Stack>
        </Fieldset>

        <SimpleGrid cols={{ base: 1, sm: 2 }}>
          <Select
            label={t('page.collection.form.status')}
            allowDeselect={false}
            data={ANIMAL_STATUSES.map((s) => ({ value: s, label: STATUS_LABELS[s] }))}
            key={form.key('status')}
            {...form.getInputProps('status')}
          />
          <DateField
            label={t('page.collection.form.statusSince')}
            withAsterisk={shape.status === 'sold' || shape.status === 'deceased'}

            key={form.key('statusOn')}
            {...form.getInputProps('statusOn')}
          />
        </SimpleGrid>
        <TextAreaField label={t('page.collection.form.notes')} maxLength={TEXT_LIMITS.animalNotes} key={form.key('notes')} {...form.getInputProps('notes')} />
        <FormActions
          message={message}
          loading={save.isPending}
          submitLabel={t(animal ? 'page.collection.form.saveChanges' : 'page.collection.form.addToCollection')}
          onCancel={onCancel}
        />
      </Stack>
    </form>
  );
}
