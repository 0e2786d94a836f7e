import { screen } from '@testing-library/react';
import type { ClaimMatch } from '@/shared/claims/types';
import { renderWithProviders } from '../testing/render';
import { MatchList } from './ResultParts';

jest.mock('expo-router', () => require('../testing/expoRouter'));

// Invented entries.
const byWords: ClaimMatch = {
  slug: 'resonant-cavity-thruster',
  title: 'Thrust from microwaves in a closed cavity',
  version: 1,
  score: 31.4,
  terms: ['caviti'],
  words: ['cavity'],
  url: 'http://127.0.0.1:8080/entries/resonant-cavity-thruster/v/1',
  inBrief: 'Radiation kept inside a closed box cannot push the box.',
};
const byFinding: ClaimMatch = {
  slug: 'faster-than-light',
  title: 'Faster than light',
  version: 2,
  score: 0,
  terms: [],
  words: [],
  url: 'http://127.0.0.1:8080/entries/faster-than-light/v/2',
  inBrief: 'Nothing carries mass or information faster than light.',
  finding: 'it states a speed above the speed of light',
};

describe('MatchList', () => {
  it('says why an entry was offered when the finding led to it, with no score or words of its own', () => {
    renderWithProviders(<MatchList matches={[byFinding]} />);
    expect(screen.getByTestId('claim-match-faster-than-light-finding').textContent).toBe('Offered because it states a speed above the speed of light.');
    expect(screen.getByTestId('claim-match-faster-than-light').textContent).not.toMatch(/match score|Words that matched/);
  });

  it('an entry matched by words shows its score and words, and no finding', () => {
    renderWithProviders(<MatchList matches={[byWords]} />);
    expect(screen.getByTestId('claim-match-resonant-cavity-thruster').textContent).toContain('match score 31');
    expect(screen.queryByTestId('claim-match-resonant-cavity-thruster-finding')).toBeNull();
  });
});
