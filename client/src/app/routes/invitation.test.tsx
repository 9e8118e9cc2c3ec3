import { screen } from '@testing-library/react';
import { Route, Routes } from 'react-router';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { renderWithProviders, stubFetch } from '@/testing/render';
import { invitationPreview as preview } from '@/features/invitations/components/invitation-fixtures.test-data';
import { Component as InvitationPage } from './invitation';

afterEach(() => vi.unstubAllGlobals());

describe('the invitation page for a visitor', () => {
  it('keeps the invitation through sign-in and through creating an account', async () => {
    vi.stubGlobal(
      'fetch',
      stubFetch({
        'GET /api/invitations/tok': () => ({ status: 200, body: preview }),
        'GET /api/auth/me': () => ({ status: 401, body: { statusCode: 401, error: 'Unauthorized', message: 'Sign in first.' } }),
      }).fetchStub,
    );
    renderWithProviders(
      <Routes>
        <Route path="/invitations/:token" element={<InvitationPage />} />
      </Routes>,
      { route: '/invitations/tok' },
    );
    expect(await screen.findByRole('link', { name: 'Sign in to join' })).toHaveAttribute('href', '/sign-in?next=%2Finvitations%2Ftok');
    expect(screen.getByRole('link', { name: /create an account/i })).toHaveAttribute('href', '/register?next=%2Finvitations%2Ftok');
  });
});
