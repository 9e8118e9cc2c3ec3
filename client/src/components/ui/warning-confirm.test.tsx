import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { renderWithProviders } from '@/testing/render';
import { ApiError } from '@/lib/api-error';
import { WarningConfirm, acknowledge, warningsOf } from './warning-confirm';

const warning = { code: 'sac-without-pairing' as const, message: 'No successful pairing is recorded on or before 2026-11-01.' };

describe('WarningConfirm', () => {
  it('reads the warnings of a 422 answer only', () => {
    const body = { statusCode: 422, error: 'Unprocessable Entity', message: warning.message, details: [{ field: 'acknowledgedWarnings', ...warning }] };
    expect(warningsOf(new ApiError(body))).toEqual([warning]);
    expect(warningsOf(new ApiError({ ...body, statusCode: 400 }))).toEqual([]);
    expect(warningsOf(new Error('x'))).toEqual([]);
  });

  it('saves anyway only with a reason, and sends the codes with it', async () => {
    const onConfirm = vi.fn();
    renderWithProviders(<WarningConfirm warnings={[warning]} loading={false} onConfirm={onConfirm} onCancel={() => undefined} />);
    expect(screen.getByText(warning.message)).toBeInTheDocument();
    const save = screen.getByRole('button', { name: 'Save anyway' });
    expect(save).toBeDisabled();
    await userEvent.type(screen.getByLabelText(/Why is it right/), 'Bought gravid');
    await userEvent.click(save);
    expect(onConfirm).toHaveBeenCalledWith('Bought gravid');
    expect(acknowledge([warning], ' Bought gravid ')).toEqual({ acknowledgedWarnings: ['sac-without-pairing'], warningReason: 'Bought gravid' });
  });
});
