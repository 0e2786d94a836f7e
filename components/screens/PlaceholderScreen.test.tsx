import { render, screen, within } from '@testing-library/react';
import { setPathname } from '../testing/expoRouter';
import { NotFoundScreen } from './NotFoundScreen';
import { PlaceholderScreen } from './PlaceholderScreen';

jest.mock('expo-router', () => require('../testing/expoRouter'));

describe('PlaceholderScreen', () => {
  it.each([
    ['check', 'Claim check', 'referee paragraph'],
    ['desk', 'Desk', 'drafts'],
    ['queue', 'Queue', 'oldest first'],
    ['account', 'Account', 'need no account'],
    ['admin', 'Admin', 'audit log'],
  ] as const)('%s has its heading and says what will come there', (section, title, words) => {
    render(<PlaceholderScreen section={section} />);
    const root = screen.getByTestId(`screen-${section}`);
    expect(within(root).getByRole('heading', { level: 1 }).textContent).toBe(title);
    expect(root.textContent).toContain(words);
    expect(screen.getByTestId(`${section}-status`).textContent).toContain('Not open yet');
  });
});

describe('NotFoundScreen', () => {
  it('names the missing address and links back to the Library', () => {
    setPathname('/no/such/page');
    render(<NotFoundScreen />);
    const root = screen.getByTestId('screen-not-found');
    expect(within(root).getByRole('heading', { level: 1 }).textContent).toBe('Page not found');
    expect(root.textContent).toContain('There is no page at /no/such/page.');
    expect(screen.getByTestId('not-found-home').getAttribute('href')).toBe('/');
    expect(screen.getByTestId('not-found-home').textContent).toBe('Back to the Library');
  });
});
