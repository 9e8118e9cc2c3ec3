import { ActionIcon, Alert, Button, Card, Checkbox, Group, Select, SimpleGrid, Stack, Switch, Text, Title } from '@mantine/core';
import { useForm } from '@mantine/form';
import { useState } from 'react';
import {
  DEFAULT_HAND_OVER_STAGE,
  INVITABLE_ROLES,
  label,
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
import { useWords, words } from '@/lib/i18n';
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

// Functions, not constants: the words follow the reader's language.
const roleOptions = () => INVITABLE_ROLES.map((r) => ({ value: r, label: label(words, 'role', r) }));

const emptyParty = (pickOrder: number): PartyValues => ({ name: '', email: '', role: 'partner', invite: true, weight: 1, fixedCount: 0, pickOrder });

function animalOption(a: AnimalSummary) {
  const text = a.custody === 'loan-in' ? 'page.projects.form.animalOnLoan' : 'page.projects.form.animal';
  return { value: a.id, label: words(text, { label: a.label, species: a.species.scientificName }) };
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
  const t = useWords();
  const LINE_RULES = lineRules(t);
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
      femaleId: (v) => (v ? null : t('page.projects.form.femaleRequired')),
      maleId: (v) => (v ? null : t('page.projects.form.maleRequired')),
      parties: {
        name: (v) => checkText(v, { required: t('page.projects.parties.nameRequired'), maxLength: TEXT_LIMITS.personName }),
        weight: (v) => checkNumber(String(v), { required: t('page.projects.proposeTerms.weightRequired'), ...LINE_RULES.weight }),
        fixedCount: (v) => checkNumber(String(v), LINE_RULES.fixedCount),
        pickOrder: (v) => checkNumber(String(v), { required: t('page.projects.proposeTerms.pickOrderRequired'), ...LINE_RULES.pickOrder }),
        email: (v, values, path) => {
          const i = Number(path.split('.')[1]);
          return values.parties[i]?.invite && !/^\S+@\S+\.\S+$/.test(v.trim()) ? t('page.projects.parties.emailForInvitation') : null;
        },
      },
      title: (v) => checkText(v, { required: t('page.projects.form.titleRequired'), maxLength: TEXT_LIMITS.projectTitle }),
      notes: (v) => checkText(v, { maxLength: TEXT_LIMITS.projectNotes }),
      ownerWeight: (v, values) =>
        values.withTerms ? checkNumber(String(v), { required: t('page.projects.form.yourWeightRequired'), ...LINE_RULES.weight }) : null,
      ownerFixedCount: (v, values) => (values.withTerms ? checkNumber(String(v), LINE_RULES.fixedCount) : null),
      ownerPickOrder: (v, values) =>
        values.withTerms ? checkNumber(String(v), { required: t('page.projects.form.yourPickOrderRequired'), ...LINE_RULES.pickOrder }) : null,
      currency: (v, values) => (!values.withTerms || /^[A-Z]{3}$/.test(v) ? null : t('page.projects.form.currency')),
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
          label={t('page.projects.form.title')}
          placeholder={t('page.projects.form.titlePlaceholder')}
          maxLength={TEXT_LIMITS.projectTitle}
          withAsterisk
          key={form.key('title')}
          {...form.getInputProps('title')}
        />
        <SimpleGrid cols={{ base: 1, sm: 2 }}>
          <Select
            label={label(t, 'sex', 'female')}
            placeholder={t('page.projects.form.femalePlaceholder')}
            data={females.map(animalOption)}
            searchable
            withAsterisk
            nothingFoundMessage={t('page.projects.form.noFemale')}
            key={form.key('femaleId')}
            {...form.getInputProps('femaleId')}
          />
          <Select
            label={label(t, 'sex', 'male')}
            placeholder={t('page.projects.form.malePlaceholder')}
            data={males.map(animalOption)}
            searchable
            withAsterisk
            nothingFoundMessage={t('page.projects.form.noMale')}
            key={form.key('maleId')}
            {...form.getInputProps('maleId')}
          />
        </SimpleGrid>
        {male?.custody === 'loan-in' && (
          <Alert color="moss" variant="light">
            <Stack gap="xs" align="flex-start">
              <Text size="sm">{t('page.projects.form.loanNote', { male: male.label })}</Text>
              {male.lender && !form.getValues().parties.some((p) => p.name === male.lender!.name) && (
                <Button
                  size="xs"
                  variant="light"
                  onClick={() => form.insertListItem('parties', { ...emptyParty(partyCount + 2), name: male.lender!.name, email: male.lender!.email ?? '' })}
                >
                  {t('page.projects.form.addLender', { name: male.lender.name })}
                </Button>
              )}
            </Stack>
          </Alert>
        )}
        <TextAreaField label={t('page.projects.form.notes')} maxLength={TEXT_LIMITS.projectNotes} key={form.key('notes')} {...form.getInputProps('notes')} />

        <Title order={3} size="h4" mt="sm">
          {t('page.projects.form.parties')}
        </Title>
        <Text size="sm" c="dimmed">
          {t('page.projects.form.partiesIntro')}
        </Text>
        {Array.from({ length: partyCount }, (_, i) => (
          <Card withBorder key={form.key(`parties.${i}`)} padding="sm" data-testid={`party-${i}`}>
            <Stack gap="xs">
              <Group justify="space-between">
                <Text fw={600} size="sm">
                  {t('page.projects.form.partyN', { number: i + 1 })}
                </Text>
                <ActionIcon
                  variant="subtle"
                  color="clay"
                  aria-label={t('page.projects.form.removeParty', { number: i + 1 })}
                  onClick={() => form.removeListItem('parties', i)}
                >
                  ×
                </ActionIcon>
              </Group>
              <SimpleGrid cols={{ base: 1, sm: 3 }}>
                <TextField
                  label={t('page.projects.parties.name')}
                  maxLength={TEXT_LIMITS.personName}
                  withAsterisk
                  key={form.key(`parties.${i}.name`)}
                  {...form.getInputProps(`parties.${i}.name`)}
                />
                <TextField
                  label={t('page.projects.parties.email')}
                  type="email"
                  maxLength={TEXT_LIMITS.email}
                  key={form.key(`parties.${i}.email`)}
                  {...form.getInputProps(`parties.${i}.email`)}
                />
                <Select
                  label={t('page.projects.parties.role')}
                  data={roleOptions()}
                  allowDeselect={false}
                  key={form.key(`parties.${i}.role`)}
                  {...form.getInputProps(`parties.${i}.role`)}
                />
              </SimpleGrid>
              <Checkbox
                label={t('page.projects.form.invite')}
                key={form.key(`parties.${i}.invite`)}
                {...form.getInputProps(`parties.${i}.invite`, { type: 'checkbox' })}
              />
              {withTerms && (
                <SimpleGrid cols={3}>
                  <NumberField
                    label={t('page.projects.proposeTerms.weight')}
                    whole
                    key={form.key(`parties.${i}.weight`)}
                    {...form.getInputProps(`parties.${i}.weight`)}
                  />
                  <NumberField
                    label={t('page.projects.proposeTerms.fixedCount')}
                    whole
                    key={form.key(`parties.${i}.fixedCount`)}
                    {...form.getInputProps(`parties.${i}.fixedCount`)}
                  />
                  <NumberField
                    label={t('page.projects.proposeTerms.pickOrder')}
                    whole
                    key={form.key(`parties.${i}.pickOrder`)}
                    {...form.getInputProps(`parties.${i}.pickOrder`)}
                  />
                </SimpleGrid>
              )}
            </Stack>
          </Card>
        ))}
        <Group>
          <Button variant="light" onClick={() => form.insertListItem('parties', emptyParty(partyCount + 2))}>
            {t('page.projects.parties.add')}
          </Button>
        </Group>

        <Title order={3} size="h4" mt="sm">
          {t('page.projects.form.terms')}
        </Title>
        <Switch label={t('page.projects.form.withTerms')} key={form.key('withTerms')} {...form.getInputProps('withTerms', { type: 'checkbox' })} />
        {withTerms && (
          <Stack>
            <Text size="sm" c="dimmed">
              {t('page.projects.form.sharesExplain')}
            </Text>
            <SimpleGrid cols={3}>
              <NumberField label={t('page.projects.form.yourWeight')} whole key={form.key('ownerWeight')} {...form.getInputProps('ownerWeight')} />
              <NumberField label={t('page.projects.form.yourFixedCount')} whole key={form.key('ownerFixedCount')} {...form.getInputProps('ownerFixedCount')} />
              <NumberField label={t('page.projects.form.yourPickOrder')} whole key={form.key('ownerPickOrder')} {...form.getInputProps('ownerPickOrder')} />
            </SimpleGrid>
            <DealFields field={(name) => ({ key: form.key(name), ...form.getInputProps(name) })} />
          </Stack>
        )}
        <FormActions message={message} loading={create.isPending} submitLabel={t('page.projects.form.submit')} />
      </Stack>
    </form>
  );
}
