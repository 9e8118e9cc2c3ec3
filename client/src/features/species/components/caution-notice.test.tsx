import { screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { renderWithProviders } from '@/testing/render';
import { CautionNotice } from './caution-notice';
import { speciesResponse } from './species-fixtures.test-data';

const cited = { kind: 'published', citation: 'Test handbook' } as const;

describe('CautionNotice', () => {
  it('warns about venom with the bite advice and the law and licensed-practice sentence', () => {
    const pokie = speciesResponse({
      id: 'p',
      scientificName: 'Poecilotheria metallica',
      cautions: {
        urticatingHairs: { value: false, source: cited },
        venom: { value: 'medically-significant', source: cited },
        cautionText: 'Fast and defensive.',
      },
      group: 'ow-arboreal',
      tradeListing: { value: 'CITES Appendix II', source: cited },
    });
    renderWithProviders(<CautionNotice species={pokie} />);
    const note = screen.getByRole('note', { name: /^Take care/ });
    expect(note).toHaveTextContent('Medically significant venom');
    expect(note).toHaveTextContent(/muscle cramps/);
    expect(note).toHaveTextContent(/seek medical help after a bite/);
    expect(note).toHaveTextContent('CITES Appendix II');
    expect(note).toHaveTextContent(/Follow the law where you live and licensed practice/);
    expect(note).not.toHaveTextContent('Urticating hairs.');
  });

  it('gives the eye and hand-washing cautions for urticating hairs', () => {
    const hairy = speciesResponse({
      id: 'h',
      scientificName: 'Tliltocatl vagans',
      cautions: { urticatingHairs: { value: true, source: cited }, venom: { value: 'no-cases-known', source: cited }, cautionText: '' },
    });
    renderWithProviders(<CautionNotice species={hairy} />);
    const note = screen.getByRole('note', { name: /^Take care/ });
    expect(note).toHaveTextContent(/eye protection/);
    expect(note).toHaveTextContent(/do not rub your eyes/);
    expect(note).toHaveTextContent(/wash your hands/);
    expect(note).toHaveTextContent(/licensed practice/);
  });

  it('shows the Old World group caution for a species whose venom is "not known", with the three-valued flag (docs/trade-facts.md §9: Ahmed et al. 2009)', () => {
    const balfouri = speciesResponse({
      id: 'b',
      scientificName: 'Monocentropus balfouri',
      group: 'ow-terrestrial',
      cautions: { urticatingHairs: { value: false, source: cited }, venom: { value: 'not-known', source: { kind: 'memory' } }, cautionText: '' },
    });
    renderWithProviders(<CautionNotice species={balfouri} />);
    const note = screen.getByRole('note', { name: /^Take care: venom not known/ });
    expect(note).toHaveTextContent('Bites: Not known: no published account either way');
    expect(note).toHaveTextContent(/severe, long-lasting muscle cramps/);
    expect(note).toHaveTextContent(/never with bare hands/);
    expect(note).toHaveTextContent('(Source: from memory)');
    expect(note).toHaveTextContent(/Follow the law where you live and licensed practice/);
  });

  it('shows the Old World group caution even when no bite case is known', () => {
    const calm = speciesResponse({
      id: 'c',
      scientificName: 'Old World calm one',
      group: 'ow-arboreal',
      cautions: { urticatingHairs: { value: false, source: cited }, venom: { value: 'no-cases-known', source: cited }, cautionText: '' },
    });
    renderWithProviders(<CautionNotice species={calm} />);
    const note = screen.getByRole('note', { name: 'Take care: its group' });
    expect(note).toHaveTextContent(/bites of Poecilotheria and related genera have caused severe cramps/);
  });

  it('shows nothing for a New World species without hairs, known bites or listing', () => {
    renderWithProviders(<CautionNotice species={speciesResponse({ id: 'x', scientificName: 'Plain species' })} />);
    expect(screen.queryByRole('note')).not.toBeInTheDocument();
  });
});
