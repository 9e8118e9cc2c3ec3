import { screen } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { wordsFor } from '@broodsilk/shared';
import { renderWithProviders, stubFetch } from '@/testing/render';
import { WithdrawalForm } from './withdrawal-form';
import { balances, PROJECT_ID, shares } from './account.fixtures';

afterEach(() => vi.unstubAllGlobals());

const en = wordsFor('en');
// Every Brachypelma (and Tliltocatl) is in CITES Appendix II: docs/trade-facts.md §9 (Cooper, West & Mendoza 2019, CEC; Mendoza & Francke 2020).
const APPENDIX_II = 'CITES Appendix II';

function renderForm(kind: 'sale' | 'cash-out', tradeListing: string | null) {
  const { fetchStub } = stubFetch({});
  vi.stubGlobal('fetch', fetchStub);
  renderWithProviders(
    <WithdrawalForm
      projectId={PROJECT_ID}
      kind={kind}
      parties={balances().parties}
      sacs={shares().sacs}
      currency="EUR"
      termsPriceMinor={400}
      tradeListing={tradeListing}
      today="2026-12-01"
    />,
  );
}

describe('WithdrawalForm cautions', { timeout: 30_000 }, () => {
  it('a sale of a listed species names its listing and needs papers, beside the caution about shipping live animals', async () => {
    renderForm('sale', APPENDIX_II);
    const listed = await screen.findByTestId('safety-saleListed');
    expect(listed).toHaveTextContent(APPENDIX_II);
    expect(listed).toHaveTextContent(en('safety.saleListed', { listing: APPENDIX_II }));
    expect(screen.getByTestId('safety-sale')).toHaveTextContent(en('safety.sale'));
  });

  it('a sale of a species with no known listing carries the general shipping caution only', async () => {
    renderForm('sale', null);
    expect(await screen.findByTestId('safety-sale')).toHaveTextContent(/Shipping live animals is regulated/);
    expect(screen.queryByTestId('safety-saleListed')).not.toBeInTheDocument();
  });

  it('a cash-out ships nothing, so it carries neither caution', async () => {
    renderForm('cash-out', APPENDIX_II);
    expect(await screen.findByRole('form', { name: 'Record a cash-out' })).toBeInTheDocument();
    expect(screen.queryByTestId('safety-sale')).not.toBeInTheDocument();
    expect(screen.queryByTestId('safety-saleListed')).not.toBeInTheDocument();
  });
});
