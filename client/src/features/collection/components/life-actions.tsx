import { Button, Group, Modal, Stack, Text } from '@mantine/core';
import { useState } from 'react';
import { PENULTIMATE_INTERVAL_MONTHS, type AnimalResponse } from '@broodsilk/shared';
import { formatDate } from '@/lib/dates';
import type { AnimalStep } from '../api/animal-season';
import { DatedStepForm } from './dated-step-form';

interface StepCopy {
  button: string;
  title: string;
  dateLabel: string;
  submit: string;
  explanation?: string;
  danger?: boolean;
}

const STEPS: Record<AnimalStep, StepCopy> = {
  premolt: {
    button: 'Flag premolt',
    title: 'In premolt',
    dateLabel: 'Premolt since',
    submit: 'Flag premolt',
    explanation: 'She shows as “not now” for pairing until a molt is recorded or you clear the flag.',
  },
  'premolt/end': { button: 'Clear premolt', title: 'Premolt over', dateLabel: 'Premolt over on', submit: 'Clear premolt' },
  'sperm-web': { button: 'Sperm web seen', title: 'Sperm web seen', dateLabel: 'Seen on', submit: 'Save' },
  return: {
    button: 'Returned to owner',
    title: 'Returned to owner',
    dateLabel: 'Returned on',
    submit: 'Confirm the return',
    explanation: 'This ends his breeding loan and writes the return on each project he is in.',
  },
  death: {
    button: 'Record death',
    title: 'Record a death',
    dateLabel: 'Died on',
    submit: 'Confirm the death',
    explanation: 'This marks the animal deceased and writes it on each open project it is in, with what the terms now say.',
    danger: true,
  },
};

/** The dated steps that apply to this animal now, each behind a small confirming form. */
function stepsFor(a: AnimalResponse): AnimalStep[] {
  if (a.status === 'deceased') return [];
  const steps: AnimalStep[] = [a.premoltSince ? 'premolt/end' : 'premolt'];
  if (a.sex === 'male' && a.maturity === 'mature') steps.push('sperm-web');
  if (a.custody === 'loan-in' && a.status === 'active') steps.push('return');
  steps.push('death');
  return steps;
}

export function LifeActions({ animal }: { animal: AnimalResponse }) {
  const [open, setOpen] = useState<AnimalStep | null>(null);
  const facts = [
    animal.premoltSince && `In premolt since ${formatDate(animal.premoltSince)}`,
    animal.spermWebOn && `Last sperm web seen ${formatDate(animal.spermWebOn)}`,
    animal.returnedOn && `Returned to the owner ${formatDate(animal.returnedOn)}`,
    animal.maturingWindow &&
      `Maturing molt expected ${formatDate(animal.maturingWindow.from)} – ${formatDate(animal.maturingWindow.to)} (${PENULTIMATE_INTERVAL_MONTHS.min}–${PENULTIMATE_INTERVAL_MONTHS.max} months after his last molt, ${animal.maturingWindow.source})`,
  ].filter((f): f is string => !!f);
  const steps = animal.editable ? stepsFor(animal) : [];
  if (!facts.length && !steps.length) return null;
  const copy = open ? STEPS[open] : null;
  return (
    <Stack gap="xs" data-testid="life-actions">
      {facts.map((f) => (
        <Text key={f} size="sm">
          {f}
        </Text>
      ))}
      <Group gap="xs">
        {steps.map((s) => (
          <Button key={s} variant="light" color={STEPS[s].danger ? 'clay' : undefined} onClick={() => setOpen(s)}>
            {STEPS[s].button}
          </Button>
        ))}
      </Group>
      <Modal opened={!!open} onClose={() => setOpen(null)} title={copy ? `${copy.title}: ${animal.label}` : ''}>
        {open && copy && (
          <DatedStepForm
            animalId={animal.id}
            step={open}
            dateLabel={copy.dateLabel}
            submitLabel={copy.submit}
            explanation={copy.explanation}
            onDone={() => setOpen(null)}
          />
        )}
      </Modal>
    </Stack>
  );
}
