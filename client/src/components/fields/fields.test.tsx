import { Button } from '@mantine/core';
import { useForm } from '@mantine/form';
import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { renderWithProviders } from '@/testing/render';
import { DateField } from './date-field';
import { NumberField } from './number-field';
import { TextAreaField } from './text-field';
import { dateRule, readDate } from './typed-date';
import { numberRule, readNumber } from './typed-number';
import { textRule } from './text-rule';
import { i18next } from '@/lib/i18n';

afterEach(async () => {
  vi.restoreAllMocks();
  await i18next.changeLanguage('en');
});

/** A small form as the app's forms use the fields: uncontrolled, rules checked on blur and on submit. */
function Harness({ onSubmit }: { onSubmit: (v: { date: string | null; size: number | null; notes: string }) => void }) {
  const form = useForm({
    mode: 'uncontrolled',
    validateInputOnBlur: true,
    initialValues: { date: '', size: '', notes: '' },
    validate: {
      date: dateRule({ required: 'Give the date.', latest: '2026-12-02' }),
      size: numberRule({ min: 0.1, max: 40, decimals: 1 }),
      notes: textRule({ maxLength: 20 }),
    },
  });
  return (
    <form onSubmit={form.onSubmit((v) => onSubmit({ date: readDate(v.date), size: readNumber(v.size), notes: v.notes }))}>
      <DateField label="Molted on" key={form.key('date')} {...form.getInputProps('date')} />
      <NumberField label="Leg span (cm)" key={form.key('size')} {...form.getInputProps('size')} />
      <TextAreaField label="Notes" maxLength={20} key={form.key('notes')} {...form.getInputProps('notes')} />
      <Button type="submit">Save</Button>
    </form>
  );
}

function setup(language = 'en-GB') {
  vi.spyOn(navigator, 'language', 'get').mockReturnValue(language);
  const onSubmit = vi.fn();
  renderWithProviders(<Harness onSubmit={onSubmit} />);
  return onSubmit;
}

describe('DateField', { timeout: 30_000 }, () => {
  it('keeps a typed day-first date exactly, says it in words and sends the ISO date', async () => {
    const onSubmit = setup('en-GB');
    const input = screen.getByLabelText('Molted on');
    await userEvent.type(input, '14/03/2025');
    expect(input).toHaveValue('14/03/2025');
    expect(input).toHaveAccessibleDescription('14 March 2025');
    await userEvent.click(screen.getByRole('button', { name: 'Save' }));
    expect(onSubmit).toHaveBeenCalledWith({ date: '2025-03-14', size: null, notes: '' });
  });

  it('refuses a future date with a message beside the field and leaves the text as typed', async () => {
    const onSubmit = setup('en-GB');
    const input = screen.getByLabelText('Molted on');
    await userEvent.type(input, '2031-05-05');
    await userEvent.tab();
    await waitFor(() => expect(input).toHaveAccessibleDescription(/5 May 2031 is after 2 December 2026/));
    expect(input).toHaveValue('2031-05-05');
    await userEvent.click(screen.getByRole('button', { name: 'Save' }));
    expect(onSubmit).not.toHaveBeenCalled();
    expect(input).toHaveValue('2031-05-05');
  });

  it('refuses a day-first date in a month-first browser rather than guessing', async () => {
    const onSubmit = setup('en-US');
    const input = screen.getByLabelText('Molted on');
    await userEvent.type(input, '14/03/2025');
    await userEvent.click(screen.getByRole('button', { name: 'Save' }));
    await waitFor(() => expect(input).toHaveAccessibleDescription(/There is no month 14/));
    expect(input).toHaveValue('14/03/2025');
    expect(onSubmit).not.toHaveBeenCalled();
  });

  it('reads 14.03.2025 as 14 March 2025 for a German reader, even in an English browser, and shows that order', async () => {
    // German numeric date order DD.MM.YYYY (DIN 5008; CLDR de pattern dd.MM.y); the echo is Intl.DateTimeFormat('de-DE', long month).
    await i18next.changeLanguage('de');
    const onSubmit = setup('en-US');
    const input = screen.getByLabelText('Molted on');
    expect(input).toHaveAttribute('placeholder', 'z. B. 14.03.2025');
    expect(input).toHaveAccessibleDescription('JJJJ-MM-TT oder TT.MM.JJJJ');
    await userEvent.type(input, '14.03.2025');
    const deWords = new Intl.DateTimeFormat('de-DE', { day: 'numeric', month: 'long', year: 'numeric', timeZone: 'UTC' }).format(
      new Date(Date.UTC(2025, 2, 14)),
    );
    expect(deWords).toBe('14. März 2025');
    expect(input).toHaveAccessibleDescription(deWords);
    await userEvent.click(screen.getByRole('button', { name: 'Save' }));
    expect(onSubmit).toHaveBeenCalledWith({ date: '2025-03-14', size: null, notes: '' });
  });
});

describe('NumberField', { timeout: 30_000 }, () => {
  it('keeps a valid typed number exactly and sends it', async () => {
    const onSubmit = setup();
    await userEvent.type(screen.getByLabelText('Molted on'), '2025-03-14');
    const input = screen.getByLabelText('Leg span (cm)');
    await userEvent.type(input, '12.5');
    expect(input).toHaveValue('12.5');
    await userEvent.click(screen.getByRole('button', { name: 'Save' }));
    expect(onSubmit).toHaveBeenCalledWith({ date: '2025-03-14', size: 12.5, notes: '' });
  });

  it('refuses 900 with a message instead of clamping it', async () => {
    const onSubmit = setup();
    await userEvent.type(screen.getByLabelText('Molted on'), '2025-03-14');
    const input = screen.getByLabelText('Leg span (cm)');
    await userEvent.type(input, '900');
    await userEvent.tab();
    await waitFor(() => expect(input).toHaveAccessibleDescription('900 is out of range: give a number from 0.1 to 40.'));
    await userEvent.click(screen.getByRole('button', { name: 'Save' }));
    expect(input).toHaveValue('900');
    expect(onSubmit).not.toHaveBeenCalled();
  });

  it('says the range with a decimal comma to a German reader and takes a typed decimal comma', async () => {
    // Reference: Intl.NumberFormat('de-DE') writes 0.1 as "0,1" (CLDR de decimal separator).
    await i18next.changeLanguage('de');
    const onSubmit = setup('en-GB');
    await userEvent.type(screen.getByLabelText('Molted on'), '2025-03-14');
    const input = screen.getByLabelText('Leg span (cm)');
    await userEvent.type(input, '900');
    await userEvent.tab();
    await waitFor(() =>
      expect(input).toHaveAccessibleDescription(`900 liegt außerhalb des Bereichs: Gib eine Zahl von ${new Intl.NumberFormat('de-DE').format(0.1)} bis 40 an.`),
    );
    await userEvent.clear(input);
    await userEvent.type(input, '12,5');
    await userEvent.click(screen.getByRole('button', { name: 'Save' }));
    expect(onSubmit).toHaveBeenCalledWith({ date: '2025-03-14', size: 12.5, notes: '' });
  });
});

describe('TextAreaField', { timeout: 30_000 }, () => {
  it('shows a counter near the limit and keeps text within it', async () => {
    const onSubmit = setup();
    await userEvent.type(screen.getByLabelText('Molted on'), '2025-03-14');
    const input = screen.getByLabelText('Notes');
    await userEvent.type(input, 'sixteen letters!');
    expect(input).toHaveAccessibleDescription('16 of 20 characters');
    await userEvent.click(screen.getByRole('button', { name: 'Save' }));
    expect(onSubmit).toHaveBeenCalledWith({ date: '2025-03-14', size: null, notes: 'sixteen letters!' });
  });

  it('keeps a pasted text over the limit whole and refuses it with a message', async () => {
    const onSubmit = setup();
    await userEvent.type(screen.getByLabelText('Molted on'), '2025-03-14');
    const input = screen.getByLabelText('Notes');
    await userEvent.click(input);
    await userEvent.paste('twenty-five characters!!!');
    expect(input).toHaveValue('twenty-five characters!!!');
    await userEvent.click(screen.getByRole('button', { name: 'Save' }));
    await waitFor(() => expect(input).toHaveAccessibleDescription(/5 characters too long: keep it to 20/));
    expect(onSubmit).not.toHaveBeenCalled();
  });
});
