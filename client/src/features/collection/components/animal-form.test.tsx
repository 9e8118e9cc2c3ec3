import { TextInput } from '@mantine/core';
import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { renderWithProviders, stubFetch } from '@/testing/render';
import { AnimalForm, type SpeciesFieldProps } from './animal-form';

afterEach(() => vi.unstubAllGlobals());

/** Pastes instead of typing key by key: the form is large and typing it is slow in jsdom. */
async function fill(input: HTMLElement, text: string) {
  await userEvent.click(input);
  await userEvent.paste(text);
}

/** The form's contract with the app layer: any picker that reports a species id. */
function PlainSpeciesField({ onChange, error }: SpeciesFieldProps) {
  return <TextInput label="Species id" error={error} onChange={(e) => onChange?.(e.currentTarget.value)} />;
}

const SPECIES_ID = '5b1f7e56-8f07-4a55-9f55-0f3c1a6f0d11';

// A loaded machine renders this large form slowly; the limit is generous, nothing here is timed.
describe('AnimalForm', { timeout: 30_000 }, () => {
  it('requires the maturing molt date for a mature male before sending anything', async () => {
    const { fetchStub, calls } = stubFetch({});
    vi.stubGlobal('fetch', fetchStub);
    const onSaved = vi.fn();
    renderWithProviders(<AnimalForm renderSpeciesPicker={(p) => <PlainSpeciesField {...p} />} onSaved={onSaved} />);
    await fill(screen.getByLabelText(/Species id/), SPECIES_ID);
    await fill(screen.getByLabelText(/^Label/), 'Ferdinand');
    await userEvent.click(screen.getByRole('radio', { name: 'Male' }));
    await userEvent.click(screen.getByRole('radio', { name: 'Mature' }));
    await userEvent.click(screen.getByRole('button', { name: 'Add to collection' }));
    const date = await screen.findByLabelText(/Maturing molt/);
    await waitFor(() => expect(date).toHaveAccessibleDescription(/needs the date of his maturing molt/));
    expect(calls.filter((c) => c.method === 'POST')).toHaveLength(0);
    expect(onSaved).not.toHaveBeenCalled();
  });

  it('does not ask an immature animal for a maturing date and sends the request', async () => {
    const { fetchStub, calls } = stubFetch({
      'GET /api/auth/csrf': () => ({ status: 200, body: { csrfToken: 't' } }),
      'POST /api/animals': () => ({ status: 201, body: { id: 'a1', label: 'Rosa' } }),
    });
    vi.stubGlobal('fetch', fetchStub);
    const onSaved = vi.fn();
    renderWithProviders(<AnimalForm renderSpeciesPicker={(p) => <PlainSpeciesField {...p} />} onSaved={onSaved} />);
    await fill(screen.getByLabelText(/Species id/), SPECIES_ID);
    await fill(screen.getByLabelText(/^Label/), 'Rosa');
    await userEvent.click(screen.getByRole('radio', { name: 'Female' }));
    expect(screen.queryByLabelText(/Maturing molt/)).not.toBeInTheDocument();
    await userEvent.click(screen.getByRole('button', { name: 'Add to collection' }));
    await waitFor(() => expect(onSaved).toHaveBeenCalled());
    const sent = calls.find((c) => c.method === 'POST' && c.path === '/api/animals')?.body as Record<string, unknown>;
    expect(sent).toMatchObject({
      speciesId: SPECIES_ID,
      label: 'Rosa',
      sex: 'female',
      maturity: 'immature',
      maturedOn: null,
      ownerKind: 'self',
      custody: 'with-owner',
    });
  });

  it('puts the server field errors next to their fields', async () => {
    const { fetchStub } = stubFetch({
      'GET /api/auth/csrf': () => ({ status: 200, body: { csrfToken: 't' } }),
      'POST /api/animals': () => ({
        status: 400,
        body: {
          statusCode: 400,
          error: 'Bad Request',
          message: 'Please correct 2 fields: label, pricePaidMinor.',
          details: [
            { field: 'label', message: 'You already have an animal labelled "Rosa".' },
            { field: 'pricePaidMinor', message: 'The price must be a whole number of cents.' },
          ],
        },
      }),
    });
    vi.stubGlobal('fetch', fetchStub);
    const onSaved = vi.fn();
    renderWithProviders(<AnimalForm renderSpeciesPicker={(p) => <PlainSpeciesField {...p} />} onSaved={onSaved} />);
    await fill(screen.getByLabelText(/Species id/), SPECIES_ID);
    await fill(screen.getByLabelText(/^Label/), 'Rosa');
    await fill(screen.getByLabelText(/Price paid/), '40');
    await fill(screen.getByLabelText(/Currency/), 'EUR');
    await userEvent.click(screen.getByRole('button', { name: 'Add to collection' }));
    await waitFor(() => expect(screen.getByLabelText(/^Label/)).toHaveAccessibleDescription(/You already have an animal labelled "Rosa"\./));
    expect(screen.getByLabelText(/Price paid/)).toHaveAccessibleDescription('The price must be a whole number of cents.');
    expect(screen.getByRole('alert')).toHaveTextContent('Please correct 2 fields');
    expect(onSaved).not.toHaveBeenCalled();
  });
});
