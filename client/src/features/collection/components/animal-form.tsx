import { Alert, Button, Fieldset, Group, NumberInput, SegmentedControl, Select, SimpleGrid, Stack, Text, TextInput, Textarea } from '@mantine/core';
import { DateInput } from '@mantine/dates';
import { useForm } from '@mantine/form';
import { Fragment, useState, type ReactNode } from 'react';
import {
  ANIMAL_SEXES,
  ANIMAL_STATUSES,
  CUSTODIES,
  MATURITIES,
  minorDigits,
  OWNER_KINDS,
  type AnimalResponse,
  type AnimalSex,
  type AnimalStatus,
  type CreateAnimalRequest,
  type Custody,
  type Maturity,
  type OwnerKind,
} from '@broodsilk/shared';
import { applyServerErrors } from '@/lib/form-errors';
import { useCreateAnimal, useUpdateAnimal } from '../api/animals';
import { CUSTODY_LABELS, MATURITY_LABELS, OWNER_LABELS, SEX_LABELS, STATUS_LABELS } from '../utils/animal-view';

/** What the form hands to the species picker the app layer plugs in. */
export interface SpeciesFieldProps {
  defaultValue?: string | null;
  defaultName?: string | null;
  onChange?: (speciesId: string | null) => void;
  error?: ReactNode;
  withAsterisk?: boolean;
}

export interface AnimalFormValues {
  speciesId: string | null;
  label: string;
  sex: AnimalSex;
  maturity: Maturity;
  maturedOn: string | null;
  acquiredOn: string | null;
  acquiredFrom: string;
  price: number | string;
  priceCurrency: string;
  ownerKind: OwnerKind;
  ownerEmail: string;
  ownerName: string;
  custody: Custody;
  custodyParty: string;
  dueBackOn: string | null;
  status: AnimalStatus;
  statusOn: string | null;
  enclosure: string;
  notes: string;
  premoltNote: string;
}

const MATURE_MALE_NEEDS_DATE = 'A mature male needs the date of his maturing molt: his male clock counts from it.';

function initialValues(a?: AnimalResponse): AnimalFormValues {
  const digits = a?.priceCurrency ? minorDigits(a.priceCurrency) : 2;
  return {
    speciesId: a?.species.id ?? null,
    label: a?.label ?? '',
    sex: a?.sex ?? 'unsexed',
    maturity: a?.maturity ?? 'immature',
    maturedOn: a?.maturedOn ?? null,
    acquiredOn: a?.acquiredOn ?? null,
    acquiredFrom: a?.acquiredFrom ?? '',
    price: a?.pricePaidMinor != null ? a.pricePaidMinor / 10 ** digits : '',
    priceCurrency: a?.priceCurrency ?? '',
    ownerKind: a?.owner.kind ?? 'self',
    ownerEmail: a?.owner.kind === 'party' ? (a.owner.email ?? '') : a?.owner.kind === 'keeper' ? '' : '',
    ownerName: a?.owner.kind === 'party' ? a.owner.name : '',
    custody: a?.custody ?? 'with-owner',
    custodyParty: a?.custodyParty ?? '',
    dueBackOn: a?.dueBackOn ?? null,
    status: a?.status ?? 'active',
    statusOn: a?.statusOn ?? null,
    enclosure: a?.enclosure ?? '',
    notes: a?.notes ?? '',
    premoltNote: a?.premoltNote ?? '',
  };
}

const text = (s: string) => (s.trim() === '' ? null : s.trim());

/** The form's values as the create/edit request; fields that do not apply are cleared. */
export function toAnimalRequest(v: AnimalFormValues): CreateAnimalRequest {
  const currency = text(v.priceCurrency)?.toUpperCase() ?? null;
  const price = v.price === '' || v.price === null ? null : Number(v.price);
  const loan = v.custody !== 'with-owner';
  return {
    speciesId: v.speciesId ?? '',
    label: v.label.trim(),
    sex: v.sex,
    maturity: v.maturity,
    maturedOn: v.maturity === 'mature' ? v.maturedOn || null : null,
    acquiredOn: v.acquiredOn || null,
    acquiredFrom: text(v.acquiredFrom),
    pricePaidMinor: price === null || Number.isNaN(price) ? null : Math.round(price * 10 ** minorDigits(currency ?? 'EUR')),
    priceCurrency: currency,
    ownerKind: v.ownerKind,
    // An edit of a keeper-owned animal may leave the e-mail empty: the owner stays as recorded.
    ownerEmail: v.ownerKind === 'self' ? null : (text(v.ownerEmail) ?? (v.ownerKind === 'keeper' ? undefined : null)),
    ownerName: v.ownerKind === 'party' ? text(v.ownerName) : null,
    custody: v.custody,
    custodyParty: loan ? text(v.custodyParty) : null,
    dueBackOn: loan ? v.dueBackOn || null : null,
    status: v.status,
    statusOn: v.statusOn || null,
    enclosure: text(v.enclosure),
    notes: text(v.notes),
    premoltNote: v.sex === 'female' ? text(v.premoltNote) : null,
  };
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
  const create = useCreateAnimal();
  const update = useUpdateAnimal(animal?.id ?? '');
  const save = animal ? update : create;
  const [message, setMessage] = useState<string | null>(null);
  const start = initialValues(animal);
  const [shape, setShape] = useState<Shape>({
    sex: start.sex,
    maturity: start.maturity,
    ownerKind: start.ownerKind,
    custody: start.custody,
    status: start.status,
  });

  const form = useForm<AnimalFormValues>({
    mode: 'uncontrolled',
    initialValues: start,
    onValuesChange: (v) =>
      setShape((s) =>
        s.sex === v.sex && s.maturity === v.maturity && s.ownerKind === v.ownerKind && s.custody === v.custody && s.status === v.status
          ? s
          : { sex: v.sex, maturity: v.maturity, ownerKind: v.ownerKind, custody: v.custody, status: v.status },
      ),
    validate: {
      speciesId: (v) => (v ? null : 'Choose a species from the catalogue.'),
      label: (v) => (v.trim() ? null : 'Give the animal a label (a name or a code on its enclosure).'),
      maturedOn: (v, all) => (all.sex === 'male' && all.maturity === 'mature' && !v ? MATURE_MALE_NEEDS_DATE : null),
      priceCurrency: (v, all) => (all.price !== '' && all.price !== null && !v.trim() ? 'Say which currency the price is in (e.g. EUR).' : null),
      ownerEmail: (v, all) =>
        all.ownerKind === 'keeper' && !v.trim() && animal?.owner.kind !== 'keeper' ? 'Give the e-mail of the keeper who owns the animal.' : null,
      ownerName: (v, all) => (all.ownerKind === 'party' && !v.trim() ? 'Give the name of the owner.' : null),
      statusOn: (v, all) =>
        (all.status === 'sold' || all.status === 'deceased') && !v ? `Give the date the animal was ${all.status === 'sold' ? 'sold' : 'found dead'}.` : null,
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
        {message && (
          <Alert color="clay" role="alert" variant="light">
            <Text size="sm" className="tone-failed">
              {message}
            </Text>
          </Alert>
        )}
        <Fragment key={form.key('speciesId')}>
          {renderSpeciesPicker({ ...form.getInputProps('speciesId'), defaultName: animal?.species.scientificName ?? null, withAsterisk: true })}
        </Fragment>
        <SimpleGrid cols={{ base: 1, sm: 2 }}>
          <TextInput label="Label" description="A name or the code on its enclosure" withAsterisk key={form.key('label')} {...form.getInputProps('label')} />
          <TextInput label="Enclosure" key={form.key('enclosure')} {...form.getInputProps('enclosure')} />
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
          <DateInput
            label="Maturing molt"
            description={matureMale ? 'His male clock counts from this date.' : 'The molt at which she matured, if known.'}
            withAsterisk={matureMale}
            valueFormat="YYYY-MM-DD"
            placeholder="YYYY-MM-DD"
            clearable
            maxDate={new Date()}
            key={form.key('maturedOn')}
            {...form.getInputProps('maturedOn')}
          />
        )}
        {shape.sex === 'female' && (
          <Textarea
            label="Premolt note"
            description="Signs she may molt soon (off food, dark abdomen): a molt after pairing loses the pairing."
            rows={2}
            key={form.key('premoltNote')}
            {...form.getInputProps('premoltNote')}
          />
        )}

        <Fieldset legend="Acquisition">
          <SimpleGrid cols={{ base: 1, sm: 2 }}>
            <DateInput
              label="Acquired on"
              valueFormat="YYYY-MM-DD"
              placeholder="YYYY-MM-DD"
              clearable
              maxDate={new Date()}
              key={form.key('acquiredOn')}
              {...form.getInputProps('acquiredOn')}
            />
            <TextInput label="Acquired from" key={form.key('acquiredFrom')} {...form.getInputProps('acquiredFrom')} />
            <NumberInput label="Price paid" min={0} decimalScale={2} hideControls key={form.key('price')} {...form.getInputProps('price')} />
            <TextInput label="Currency" placeholder="EUR" maxLength={3} key={form.key('priceCurrency')} {...form.getInputProps('priceCurrency')} />
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
              <TextInput
                label="Owner's e-mail"
                description={animal?.owner.kind === 'keeper' ? `Now ${animal.owner.name}; leave empty to keep` : 'The e-mail they sign in to Broodsilk with'}
                type="email"
                withAsterisk={animal?.owner.kind !== 'keeper'}
                key={form.key('ownerEmail')}
                {...form.getInputProps('ownerEmail')}
              />
            )}
            {shape.ownerKind === 'party' && (
              <SimpleGrid cols={{ base: 1, sm: 2 }}>
                <TextInput label="Owner's name" withAsterisk key={form.key('ownerName')} {...form.getInputProps('ownerName')} />
                <TextInput label="Owner's e-mail" type="email" key={form.key('ownerEmail')} {...form.getInputProps('ownerEmail')} />
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
                <TextInput
                  label={shape.custody === 'loan-in' ? 'Lent to me by' : 'Held by'}
                  description={shape.custody === 'loan-in' ? 'Leave empty when it is the owner' : undefined}
                  withAsterisk={shape.custody === 'loan-out'}
                  key={form.key('custodyParty')}
                  {...form.getInputProps('custodyParty')}
                />
                <DateInput
                  label="Due back on"
                  valueFormat="YYYY-MM-DD"
                  placeholder="YYYY-MM-DD"
                  clearable
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
          <DateInput
            label="Status since"
            withAsterisk={shape.status === 'sold' || shape.status === 'deceased'}
            valueFormat="YYYY-MM-DD"
            placeholder="YYYY-MM-DD"
            clearable
            maxDate={new Date()}
            key={form.key('statusOn')}
            {...form.getInputProps('statusOn')}
          />
        </SimpleGrid>
        <Textarea label="Notes" rows={3} key={form.key('notes')} {...form.getInputProps('notes')} />
        <Group justify="flex-end">
          {onCancel && (
            <Button variant="default" onClick={onCancel} size="md">
              Cancel
            </Button>
          )}
          <Button type="submit" loading={save.isPending} size="md">
            {animal ? 'Save changes' : 'Add to collection'}
          </Button>
        </Group>
      </Stack>
    </form>
  );
}
