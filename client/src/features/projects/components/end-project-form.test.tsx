import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { renderWithProviders } from '@/testing/render';
import { EndProjectForm } from './end-project-form';

// Product rule (docs/product.md, Attempts, males and the end of a project): the current setback pre-fills the reason.
describe('EndProjectForm', () => {
  it('starts from the setback the facts show', async () => {
    renderWithProviders(<EndProjectForm projectId="p1" setback="sac-eaten" />);
    await userEvent.click(screen.getByRole('button', { name: 'End this project early' }));
    expect(screen.getByLabelText('Reason', { selector: 'input' })).toHaveValue('The sac was eaten');
  });

  it('asks for a reason when there is no setback', async () => {
    renderWithProviders(<EndProjectForm projectId="p1" />);
    await userEvent.click(screen.getByRole('button', { name: 'End this project early' }));
    expect(screen.getByLabelText('Reason', { selector: 'input' })).toHaveValue('');
  });
});
