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

const MATURE_MALE_NEEDS_DATE = 'A mature male needs the date of his maturing molt: his male clock counts from it.';
const NOT_IN_FUTURE = 'This has happened, so it cannot be after today.';

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
      speciesId: (v) => (v ? null : 'Choose a species from the catalogue.'),
      label: textRule({ required: 'Give the animal a label (a name or a code on its enclosure).', maxLength: TEXT_LIMITS.animalLabel }),
      enclosure: textRule({ maxLength: TEXT_LIMITS.enclosure }),
      maturedOn: (v, all) =>
        checkDate(v, {
          required: all.sex === 'male' && all.maturity === 'mature' ? MATURE_MALE_NEEDS_DATE : undefined,
          latest: today,
          latestMessage: NOT_IN_FUTURE,
        }),
      acquiredOn: (v) => checkDate(v, { latest: today, latestMessage: NOT_IN_FUTURE }),
      acquiredFrom: textRule({ maxLength: TEXT_LIMITS.acquiredFrom }),
      price: (v, all) =>
        checkNumber(v, {
          min: 0,
          max: 1_000_000,
          decimals: minorDigits(all.priceCurrency.trim().toUpperCase() || 'EUR'),
          rangeMessage: 'A price is from 0 to 1,000,000.',
        }),
      priceCurrency: (v, all) => (all.price.trim() !== '' && !v.trim() ? 'Say which currency the price is in (e.g. EUR).' : null),
      custodyParty: textRule({ maxLength: TEXT_LIMITS.personName }),
      dueBackOn: (v) => checkDate(v),
      notes: textRule({ maxLength: TEXT_LIMITS.animalNotes }),
      premoltNote: textRule({ maxLength: TEXT_LIMITS.premoltNote }),
      ownerEmail: (v, all) =>
        all.ownerKind === 'keeper' && !v.trim() && animal?.owner.kind !== 'keeper' ? 'Give the e-mail of the keeper who owns the animal.' : null,
      ownerName: (v, all) => (all.ownerKind === 'party' && !v.trim() ? 'Give the name of the owner.' : null),
      statusOn: (v, all) =>
        checkDate(v, {
          required:
            all.status === 'sold' || all.status === 'deceased' ? `Give the date the animal was ${all.status === 'sold' ? 'sold' : 'found dead'}.` : undefined,
          latest: today,
          latestMessage: NOT_IN_FUTURE,
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
    <form onSubmit={submit} noValidate aria-label={animal ? 'Edit animal' : 'Add animal'}>
      <Stack>
        <Fragment key={form.key('speciesId')}>
          {renderSpeciesPicker({ ...form.getInputProps('speciesId'), defaultName: animal?.species.scientificName ?? null, withAsterisk: true })}
        </Fragment>
        <SimpleGrid cols={{ base: 1, sm: 2 }}>
          <TextField
            label="Label"
            description="A name or the code on its enclosure"
            withAsterisk
            maxLength={TEXT_LIMITS.animalLabel}
            key={form.key('label')}
            {...form.getInputProps('label')}
          />
          <TextField label="Enclosure" maxLength={TEXT_LIMITS.enclosure} key={form.key('enclosure')} {...form.getInputProps('enclosure')} />
        </SimpleGrid>
        <SimpleGrid cols={{ base: 1, sm: 2 }}>
          <Stack gap={4}>
            <Text size="sm" fw={500} id="animal-sex-label">
              Sex
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
              Maturity
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
            label="Maturing molt"
            description={matureMale ? 'His male clock counts from this date.' : 'The molt at which she matured, if known.'}
            withAsterisk={matureMale}

            key={form.key('maturedOn')}
            {...form.getInputProps('maturedOn')}
          />
        )}
        {shape.sex === 'female' && (
          <TextAreaField
            maxLength={TEXT_LIMITS.premoltNote}
            label="Premolt note"
            description="Signs she may molt soon (off food, dark abdomen): a molt after pairing loses the pairing."
            rows={2}
            key={form.key('premoltNote')}
            {...form.getInputProps('premoltNote')}
          />
        )}

        <Fieldset legend="Acquisition">
          <SimpleGrid cols={{ base: 1, sm: 2 }}>
            <DateField
              label="Acquired on"

              key={form.key('acquiredOn')}
              {...form.getInputProps('acquiredOn')}
            />
            <TextField label="Acquired from" maxLength={TEXT_LIMITS.acquiredFrom} key={form.key('acquiredFrom')} {...form.getInputProps('acquiredFrom')} />
            <NumberField label="Price paid" key={form.key('price')} {...form.getInputProps('price')} />
            <TextField label="Currency" placeholder="EUR" maxLength={3} key={form.key('priceCurrency')} {...form.getInputProps('priceCurrency')} />
          </SimpleGrid>
        </Fieldset>

        <Fieldset legend="Owner and custody">
          <Stack>
            <Select
              label="Owner"
              allowDeselect={false}
              data={OWNER_KINDS.map((k) => ({ value: k, label: OWNER_LABELS[k] }))}
              key={form.key('ownerKind')}
              {...form.getInputProps('ownerKind')}
            />
            {shape.ownerKind === 'keeper' && (
              <TextField
                label="Owner's e-mail"
                maxLength={TEXT_LIMITS.email}
                description={animal?.owner.kind === 'keeper' ? `Now ${animal.owner.name}; leave empty to keep` : 'The e-mail they sign in to Broodsilk with'}
                type="email"
                withAsterisk={animal?.owner.kind !== 'keeper'}
                key={form.key('ownerEmail')}
                {...form.getInputProps('ownerEmail')}
              />
            )}
            {shape.ownerKind === 'party' && (
              <SimpleGrid cols={{ base: 1, sm: 2 }}>
                <TextField
                  label="Owner's name"
                  withAsterisk
                  maxLength={TEXT_LIMITS.personName}
                  key={form.key('ownerName')}
                  {...form.getInputProps('ownerName')}
                />
                <TextField
                  label="Owner's e-mail"
                  type="email"
                  maxLength={TEXT_LIMITS.email}
                  key={form.key('ownerEmail')}
                  {...form.getInputProps('ownerEmail')}
                />
              </SimpleGrid>
            )}
            <Select
              label="Custody"
              allowDeselect={false}
              data={CUSTODIES.map((c) => ({ value: c, label: CUSTODY_LABELS[c] }))}
              key={form.key('custody')}
              {...form.getInputProps('custody')}
            />
            {loan && (
              <SimpleGrid cols={{ base: 1, sm: 2 }}>
                <TextField
                  maxLength={TEXT_LIMITS.personName}
                  label={shape.custody === 'loan-in' ? 'Lent to me by' : 'Held by'}
                  description={shape.custody === 'loan-in' ? 'Leave empty when it is the owner' : undefined}
                  withAsterisk={shape.custody === 'loan-out'}
                  key={form.key('custodyParty')}
                  {...form.getInputProps('custodyParty')}
                />
                <DateField
                  label="Due back on"

                  key={form.key('dueBackOn')}
                  {...form.getInputProps('dueBackOn')}
                />
              </SimpleGrid>
            )}
          </Stack>
        </Fieldset>

        <SimpleGrid cols={{ base: 1, sm: 2 }}>
          <Select
            label="Status"
            allowDeselect={false}
            data={ANIMAL_STATUSES.map((s) => ({ value: s, label: STATUS_LABELS[s] }))}
            key={form.key('status')}
            {...form.getInputProps('status')}
          />
          <DateField
            label="Status since"
            withAsterisk={shape.status === 'sold' || shape.status === 'deceased'}

            key={form.key('statusOn')}
            {...form.getInputProps('statusOn')}
          />
        </SimpleGrid>
        <TextAreaField label="Notes" maxLength={TEXT_LIMITS.animalNotes} key={form.key('notes')} {...form.getInputProps('notes')} />
        <FormActions message={message} loading={save.isPending} submitLabel={animal ? 'Save changes' : 'Add to collection'} onCancel={onCancel} />
      </Stack>
    </form>
  );
}
