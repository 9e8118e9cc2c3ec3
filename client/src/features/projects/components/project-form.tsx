import { ActionIcon, Alert, Button, Card, Checkbox, Group, Select, SimpleGrid, Stack, Switch, Text, Title } from '@mantine/core';
import { useForm } from '@mantine/form';
import { useState } from 'react';
import {
  DEFAULT_HAND_OVER_STAGE,
  TEXT_LIMITS,
  toMinor,
  type AnimalSummary,
  type BroodStage,
  type FailureClause,
  type InvitableRole,
  type ShippingPayer,
} from '@broodsilk/shared';
import { applyServerErrors } from '@/lib/form-errors';
import { useCreateProject, type NewProjectResult } from '../hooks/use-create-project';
import { priceError } from '../utils/price';
import { lineRules } from './propose-terms-form';
import { words } from '@/lib/i18n';
import { DealFields } from './deal-fields';
import { FormActions } from '@/components/ui/form-actions';
import { NumberField } from '@/components/fields/number-field';
import { TextAreaField, TextField } from '@/components/fields/text-field';
import { checkText } from '@/components/fields/text-rule';
import { checkNumber } from '@/components/fields/typed-number';

interface PartyValues {
  name: string;
  email: string;
  role: InvitableRole;
  invite: boolean;
  weight: number | string;
  fixedCount: number | string;
  pickOrder: number | string;
}

interface Values {
  title: string;
  femaleId: string | null;
  maleId: string | null;
  notes: string;
  parties: PartyValues[];
  withTerms: boolean;
  ownerWeight: number | string;
  ownerFixedCount: number | string;
  ownerPickOrder: number | string;
  price: number | string;
  currency: string;
  failureClause: FailureClause;
  handOverStage: BroodStage;
  shippingPaidBy: ShippingPayer;
}

const roleOptions = [
  { value: 'partner', label: 'Partner' },
  { value: 'caretaker', label: 'Caretaker' },
];

const emptyParty = (pickOrder: number): PartyValues => ({ name: '', email: '', role: 'partner', invite: true, weight: 1, fixedCount: 0, pickOrder });

function animalOption(a: AnimalSummary) {
  const loan = a.custody === 'loan-in' ? ' · on loan to you' : '';
  return { value: a.id, label: `${a.label} · ${a.species.scientificName}${loan}` };
}

interface ProjectFormProps {
  females: AnimalSummary[];
  males: AnimalSummary[];
  onCreated: (result: NewProjectResult) => void;
}

/** A new project: the pair from the keeper's collection, the parties, and the first terms. */
export function ProjectForm({ females, males, onCreated }: ProjectFormProps) {
  const create = useCreateProject();
  const [message, setMessage] = useState<string | null>(null);
  const [partyCount, setPartyCount] = useState(0);
  const [withTerms, setWithTerms] = useState(true);
  const [maleId, setMaleId] = useState<string | null>(null);
  const LINE_RULES = lineRules(words);
  const form = useForm<Values>({
    mode: 'uncontrolled',
    validateInputOnBlur: true,
    initialValues: {
      title: '',
      femaleId: null,
      maleId: null,
      notes: '',
      parties: [],
      withTerms: true,
      ownerWeight: 1,
      ownerFixedCount: 0,
      ownerPickOrder: 1,
      price: 0,
      currency: 'EUR',
      failureClause: 'nothing-owed',
      handOverStage: DEFAULT_HAND_OVER_STAGE,
      shippingPaidBy: 'recipient',
    },
    validate: {
      femaleId: (v) => (v ? null : 'Choose the female.'),
      maleId: (v) => (v ? null : 'Choose the male.'),
      parties: {
        name: (v) => checkText(v, { required: 'Give the party a name.', maxLength: TEXT_LIMITS.personName }),
        weight: (v) => checkNumber(String(v), { required: 'Give a weight.', ...LINE_RULES.weight }),
        fixedCount: (v) => checkNumber(String(v), LINE_RULES.fixedCount),
        pickOrder: (v) => checkNumber(String(v), { required: 'Give a pick order.', ...LINE_RULES.pickOrder }),
        email: (v, values, path) => {
          const i = Number(path.split('.')[1]);
          return values.parties[i]?.invite && !/^\S+@\S+\.\S+$/.test(v.trim()) ? 'An invitation needs an e-mail address.' : null;
        },
      },
      title: (v) => checkText(v, { required: 'Give the project a title.', maxLength: TEXT_LIMITS.projectTitle }),
      notes: (v) => checkText(v, { maxLength: TEXT_LIMITS.projectNotes }),
      ownerWeight: (v, values) => (values.withTerms ? checkNumber(String(v), { required: 'Give your weight.', ...LINE_RULES.weight }) : null),
      ownerFixedCount: (v, values) => (values.withTerms ? checkNumber(String(v), LINE_RULES.fixedCount) : null),
      ownerPickOrder: (v, values) => (values.withTerms ? checkNumber(String(v), { required: 'Give your pick order.', ...LINE_RULES.pickOrder }) : null),
      currency: (v, values) => (!values.withTerms || /^[A-Z]{3}$/.test(v) ? null : 'A three-letter code, e.g. EUR.'),
      price: (v, values) => (values.withTerms ? priceError(v, values.currency) : null),
    },
  });
  form.watch('parties', ({ value }) => setPartyCount(value.length));
  form.watch('withTerms', ({ value }) => setWithTerms(value));
  form.watch('maleId', ({ value }) => setMaleId(value));
  const male = males.find((m) => m.id === maleId);

  const submit = form.onSubmit(async (v) => {
    setMessage(null);
    try {
      const result = await create.mutateAsync({
        project: { title: v.title.trim(), femaleId: v.femaleId!, maleId: v.maleId!, notes: v.notes.trim() || null },
        parties: v.parties.map((p) => ({
          name: p.name.trim(),
          email: p.email.trim() || null,
          role: p.role,
          invite: p.invite && !!p.email.trim(),
          terms: { weight: Number(p.weight), fixedCount: Number(p.fixedCount) || 0, pickOrder: Number(p.pickOrder) },
        })),
        terms: v.withTerms
          ? {
              ownerLine: { weight: Number(v.ownerWeight), fixedCount: Number(v.ownerFixedCount) || 0, pickOrder: Number(v.ownerPickOrder) },
              pricePerSpiderlingMinor: toMinor(v.price, v.currency),
              currency: v.currency,
              failureClause: v.failureClause,
              handOverStage: v.handOverStage,
              shippingPaidBy: v.shippingPaidBy,
            }
          : null,
      });
      onCreated(result);
    } catch (e) {
      setMessage(applyServerErrors(form, e));
    }
  });

  return (
    <form onSubmit={submit} noValidate>
      <Stack maw={760}>
        <TextField
          label="Title"
          placeholder="e.g. Regalis 2027, MO-007 × MO-030"
          maxLength={TEXT_LIMITS.projectTitle}
          withAsterisk
          key={form.key('title')}
          {...form.getInputProps('title')}
        />
        <SimpleGrid cols={{ base: 1, sm: 2 }}>
          <Select
            label="Female"
            placeholder="Mature female from your collection"
            data={females.map(animalOption)}
            searchable
            withAsterisk
            nothingFoundMessage="No mature female in your collection"
            key={form.key('femaleId')}
            {...form.getInputProps('femaleId')}
          />
          <Select
            label="Male"
            placeholder="Mature male, yours or on loan"
            data={males.map(animalOption)}
            searchable
            withAsterisk
            nothingFoundMessage="No mature male in your collection"
            key={form.key('maleId')}
            {...form.getInputProps('maleId')}
          />
        </SimpleGrid>
        {male?.custody === 'loan-in' && (
          <Alert color="moss" variant="light">
            <Stack gap="xs" align="flex-start">
              <Text size="sm">{male.label} is on a breeding loan to you. Add his owner as a partner so they can follow the project and agree the split.</Text>
              {male.lender && !form.getValues().parties.some((p) => p.name === male.lender!.name) && (
                <Button
                  size="xs"
                  variant="light"
                  onClick={() => form.insertListItem('parties', { ...emptyParty(partyCount + 2), name: male.lender!.name, email: male.lender!.email ?? '' })}
                >
                  Add {male.lender.name} as a partner
                </Button>
              )}
            </Stack>
          </Alert>
        )}
        <TextAreaField label="Notes" maxLength={TEXT_LIMITS.projectNotes} key={form.key('notes')} {...form.getInputProps('notes')} />

        <Title order={3} size="h4" mt="sm">
          Parties
        </Title>
        <Text size="sm" c="dimmed">
          You take part as the keeper. Add partners who share in the brood and a caretaker who rolls the eggs. With an e-mail address they get an invitation to
          join; without one they are kept on record.
        </Text>
        {Array.from({ length: partyCount }, (_, i) => (
          <Card withBorder key={form.key(`parties.${i}`)} padding="sm" data-testid={`party-${i}`}>
            <Stack gap="xs">
              <Group justify="space-between">
                <Text fw={600} size="sm">
                  Party {i + 1}
                </Text>
                <ActionIcon variant="subtle" color="clay" aria-label={`Remove party ${i + 1}`} onClick={() => form.removeListItem('parties', i)}>
                  ×
                </ActionIcon>
              </Group>
              <SimpleGrid cols={{ base: 1, sm: 3 }}>
                <TextField
                  label="Name"
                  maxLength={TEXT_LIMITS.personName}
                  withAsterisk
                  key={form.key(`parties.${i}.name`)}
                  {...form.getInputProps(`parties.${i}.name`)}
                />
                <TextField
                  label="E-mail"
                  type="email"
                  maxLength={TEXT_LIMITS.email}
                  key={form.key(`parties.${i}.email`)}
                  {...form.getInputProps(`parties.${i}.email`)}
                />
                <Select
                  label="Role"
                  data={roleOptions}
                  allowDeselect={false}
                  key={form.key(`parties.${i}.role`)}
                  {...form.getInputProps(`parties.${i}.role`)}
                />
              </SimpleGrid>
              <Checkbox
                label="Send an invitation to join"
                key={form.key(`parties.${i}.invite`)}
                {...form.getInputProps(`parties.${i}.invite`, { type: 'checkbox' })}
              />
              {withTerms && (
                <SimpleGrid cols={3}>
                  <NumberField label="Weight" whole key={form.key(`parties.${i}.weight`)} {...form.getInputProps(`parties.${i}.weight`)} />
                  <NumberField label="Fixed count" whole key={form.key(`parties.${i}.fixedCount`)} {...form.getInputProps(`parties.${i}.fixedCount`)} />
                  <NumberField label="Pick order" whole key={form.key(`parties.${i}.pickOrder`)} {...form.getInputProps(`parties.${i}.pickOrder`)} />
                </SimpleGrid>
              )}
            </Stack>
          </Card>
        ))}
        <Group>
          <Button variant="light" onClick={() => form.insertListItem('parties', emptyParty(partyCount + 2))}>
            Add a party
          </Button>
        </Group>

        <Title order={3} size="h4" mt="sm">
          Terms
        </Title>
        <Switch
          label="Propose terms now (partners accept them on the project page)"
          key={form.key('withTerms')}
          {...form.getInputProps('withTerms', { type: 'checkbox' })}
        />
        {withTerms && (
          <Stack>
            <Text size="sm" c="dimmed">
              Shares are each party&apos;s weight over the sum of weights (partners only; caretakers take no share). A fixed count comes off the top first.
            </Text>
            <SimpleGrid cols={3}>
              <NumberField label="Your weight" whole key={form.key('ownerWeight')} {...form.getInputProps('ownerWeight')} />
              <NumberField label="Your fixed count" whole key={form.key('ownerFixedCount')} {...form.getInputProps('ownerFixedCount')} />
              <NumberField label="Your pick order" whole key={form.key('ownerPickOrder')} {...form.getInputProps('ownerPickOrder')} />
            </SimpleGrid>
            <DealFields field={(name) => ({ key: form.key(name), ...form.getInputProps(name) })} />
          </Stack>
        )}
        <FormActions message={message} loading={create.isPending} submitLabel="Create project" />
      </Stack>
    </form>
  );
}
