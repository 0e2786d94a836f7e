import { act, fireEvent, screen, within } from '@testing-library/react';
import { setPathname } from '../testing/expoRouter';
import { renderWithProviders } from '../testing/render';
import { Navigation } from './Navigation';
import { sections } from './sections';

jest.mock('expo-router', () => require('../testing/expoRouter'));

beforeEach(() => setPathname('/'));

const isShown = (el: HTMLElement) => getComputedStyle(el).display !== 'none';

describe('the bottom bar', () => {
  it('gives each destination an icon and a one-line label', () => {
    renderWithProviders(<Navigation variant="bar" role="editor" />);
    for (const key of ['library', 'check', 'checks', 'desk', 'account']) {
      const item = screen.getByTestId(`nav-${key}`);
      expect(item.querySelector(`[data-testid="icon-${key}"]`)).not.toBeNull();
      const label = within(item).getByText(sections.find((s) => s.key === key)!.short);
      // numberOfLines={1}: react-native-web clips to one line with an ellipsis, never a second line.
      expect(getComputedStyle(label).whiteSpace).toBe('nowrap');
    }
    expect(screen.queryByTestId('nav-more')).toBeNull();
  });

  it('offers an admin "More", which lists Queue, Admin and Account and says whether it is open', () => {
    renderWithProviders(<Navigation variant="bar" role="admin" />);
    const more = screen.getByTestId('nav-more');
    const list = screen.getByTestId('nav-more-list');
    expect(more.getAttribute('aria-expanded')).toBe('false');
    expect(more.getAttribute('aria-controls')).toBe(list.id);
    expect(isShown(list)).toBe(false);
    fireEvent.click(more);
    expect(more.getAttribute('aria-expanded')).toBe('true');
    expect(isShown(list)).toBe(true);
    expect(within(list).getAllByRole('link').map((a) => a.getAttribute('href'))).toEqual(['/queue', '/admin', '/account']);
    expect(within(list).getByText('Admin')).toBeTruthy();
    // Each section is in the bar or in the list, never both.
    expect(screen.getAllByTestId('nav-admin')).toHaveLength(1);
    expect(screen.getAllByTestId('nav-desk')).toHaveLength(1);
  });

  it('closes "More" on Escape and gives focus back to it', () => {
    renderWithProviders(<Navigation variant="bar" role="admin" />);
    const more = screen.getByTestId('nav-more');
    fireEvent.click(more);
    expect(document.activeElement).toBe(screen.getByTestId('nav-queue'));
    fireEvent.keyDown(document, { key: 'Escape' });
    expect(more.getAttribute('aria-expanded')).toBe('false');
    expect(document.activeElement).toBe(more);
  });

  it('closes "More" when the page changes, and marks it when the current page is behind it', () => {
    const { rerender } = renderWithProviders(<Navigation variant="bar" role="admin" />);
    fireEvent.click(screen.getByTestId('nav-more'));
    act(() => setPathname('/admin/audit'));
    rerender(<Navigation variant="bar" role="admin" />);
    expect(screen.getByTestId('nav-more').getAttribute('aria-expanded')).toBe('false');
    expect(screen.getByTestId('nav-more').getAttribute('aria-label')).toMatch(/current page/);
    expect(screen.getByTestId('nav-admin').getAttribute('aria-current')).toBe('page');
  });
});
