import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { renderWithProviders } from '@/testing/render';
import { ApiError } from '@/lib/api-error';
import { i18next } from '@/lib/i18n';
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

  it('shows a warning that names its catalogue sentence in the reader’s language, dates in their format', async () => {
    await i18next.changeLanguage('de');
    try {
      const keyed = { ...warning, key: 'rule.warning.sac-without-pairing', values: { layDate: '2026-11-01' } };
      const body = { statusCode: 422, error: 'Unprocessable Entity', message: warning.message, details: [{ field: 'acknowledgedWarnings', ...keyed }] };
      const [read] = warningsOf(new ApiError(body));
      renderWithProviders(<WarningConfirm warnings={[read!]} loading={false} onConfirm={() => undefined} onCancel={() => undefined} />);
      // the date as Intl.DateTimeFormat('de') writes it with a short month (CLDR de: "1. Nov. 2026")
      const day = new Intl.DateTimeFormat('de', { day: 'numeric', month: 'short', year: 'numeric', timeZone: 'UTC' }).format(Date.UTC(2026, 10, 1));
      expect(day).toBe('1. Nov. 2026');
      expect(screen.getByRole('listitem')).toHaveTextContent(`Am oder vor dem ${day} ist keine erfolgreiche Verpaarung eingetragen.`);
    } finally {
      await i18next.changeLanguage('en');
    }
  });
});
