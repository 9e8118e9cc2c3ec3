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
        medicallySignificantVenom: { value: true, source: cited },
        cautionText: 'Fast and defensive.',
      },
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
      cautions: { urticatingHairs: { value: true, source: cited }, medicallySignificantVenom: { value: false, source: cited }, cautionText: '' },
    });
    renderWithProviders(<CautionNotice species={hairy} />);
    const note = screen.getByRole('note', { name: /^Take care/ });
    expect(note).toHaveTextContent(/eye protection/);
    expect(note).toHaveTextContent(/do not rub your eyes/);
    expect(note).toHaveTextContent(/wash your hands/);
    expect(note).toHaveTextContent(/licensed practice/);
  });

  it('shows nothing for a species without hairs, venom or listing', () => {
    renderWithProviders(<CautionNotice species={speciesResponse({ id: 'x', scientificName: 'Plain species' })} />);
    expect(screen.queryByRole('note')).not.toBeInTheDocument();
  });
});
