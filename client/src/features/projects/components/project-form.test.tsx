import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { renderWithProviders, stubFetch } from '@/testing/render';
import { ProjectForm } from './project-form';
import { animalSummary as animal } from '@/testing/animal-summary';

afterEach(() => vi.unstubAllGlobals());

describe('ProjectForm with a male on loan', () => {
  it('offers the male’s owner as a partner, with the e-mail address the loan was recorded with', async () => {
    vi.stubGlobal('fetch', stubFetch({}).fetchStub);
    const male = animal({ id: 'm1', label: 'MO-030', sex: 'male', custody: 'loan-in', lender: { name: 'Tomasz Wierzba', email: 'tomasz@example.test' } });
    renderWithProviders(<ProjectForm females={[animal({ id: 'f1', label: 'MO-007' })]} males={[male]} onCreated={vi.fn()} />);
    await userEvent.click(screen.getAllByLabelText(/^Male/)[0]);
    // The dropdown stays display:none in jsdom (its transition never runs), so the option is found with hidden: true.
    await userEvent.click(screen.getByRole('option', { name: /MO-030/, hidden: true }));
    await userEvent.click(await screen.findByRole('button', { name: 'Add Tomasz Wierzba as a partner' }));
    const party = screen.getByTestId('party-0');
    expect(within(party).getByLabelText(/^Name/)).toHaveValue('Tomasz Wierzba');
    expect(within(party).getByLabelText(/^E-mail/)).toHaveValue('tomasz@example.test');
    expect(screen.queryByRole('button', { name: 'Add Tomasz Wierzba as a partner' })).not.toBeInTheDocument();
  }, 20_000);
});
