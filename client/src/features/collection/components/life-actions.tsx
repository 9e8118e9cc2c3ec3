import { Button, Group, Modal, Stack, Text } from '@mantine/core';
import { useState } from 'react';
import { PENULTIMATE_INTERVAL_MONTHS, type AnimalResponse } from '@broodsilk/shared';
import { label } from '@broodsilk/shared';
import { useWords } from '@/lib/i18n';
import type { AnimalStep } from '../api/animal-season';
import { DatedStepForm } from './dated-step-form';

/** Each step's words in the catalogue (`page.collection.step.<key>`: button, title, dateLabel, submit, explanation). */
const STEPS: Record<AnimalStep, { key: string; explained?: boolean; danger?: boolean }> = {
  premolt: { key: 'premolt', explained: true },
  'premolt/end': { key: 'premoltEnd' },
  'sperm-web': { key: 'spermWeb' },
  return: { key: 'return', explained: true },
  death: { key: 'death', explained: true, danger: true },
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
  const t = useWords();
  const [open, setOpen] = useState<AnimalStep | null>(null);
  const facts = [
    animal.premoltSince && t('page.collection.step.premoltSince', { date: animal.premoltSince }),
    animal.spermWebOn && t('page.collection.step.spermWebSeen', { date: animal.spermWebOn }),
    animal.returnedOn && t('page.collection.step.returnedOn', { date: animal.returnedOn }),
    animal.maturingWindow &&
      t('page.collection.step.maturingExpected', {
        from: animal.maturingWindow.from,
        to: animal.maturingWindow.to,
        min: PENULTIMATE_INTERVAL_MONTHS.min,
        max: PENULTIMATE_INTERVAL_MONTHS.max,
        source: label(t, 'valueMark', 'memory'),
      }),
  ].filter((f): f is string => !!f);
  const steps = animal.editable ? stepsFor(animal) : [];
  if (!facts.length && !steps.length) return null;
  const stepWords = (step: AnimalStep, name: string) => t(`page.collection.step.${STEPS[step].key}.${name}`, { label: animal.label });
  const title = open ? stepWords(open, 'title') : '';
  const buttons = steps.map((s) => ({ step: s, text: stepWords(s, 'button') }));
  return (
    <Stack gap="xs" data-testid="life-actions">
      {facts.map((f) => (
        <Text key={f} size="sm">
          {f}
        </Text>
      ))}
      <Group gap="xs">
        {buttons.map(({ step, text }) => (
          <Button key={step} variant="light" color={STEPS[step].danger ? 'clay' : undefined} onClick={() => setOpen(step)}>
            {text}
          </Button>
        ))}
      </Group>
      <Modal opened={!!open} onClose={() => setOpen(null)} title={title}>
        {open && (
          <DatedStepForm
            animalId={animal.id}
            step={open}
            dateLabel={stepWords(open, 'dateLabel')}
            submitLabel={stepWords(open, 'submit')}
            explanation={STEPS[open].explained ? stepWords(open, 'explanation') : undefined}
            onDone={() => setOpen(null)}
          />
        )}
      </Modal>
    </Stack>
  );
}
