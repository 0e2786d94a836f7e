import { screen, within } from '@testing-library/react';
import { CHECK_NAMES, checkList } from '@/shared/checks';
import { jsonResponse, mockFetch, renderWithProviders } from '../testing/render';
import { CheckListScreen } from './CheckListScreen';

jest.mock('expo-router', () => require('../testing/expoRouter'));

const worksheets = [
  { name: 'photon-sheet', title: 'Photon bound by hand', summary: 'The bound, worked as steps.' },
  { name: 'heat-engine', title: 'A heat engine against Carnot', summary: '' },
];

describe('CheckListScreen', () => {
  it('lists every check of the kit in plain words, each linking to its screen', () => {
    mockFetch({ '/api/worksheets': () => jsonResponse(200, { worksheets }) });
    renderWithProviders(<CheckListScreen />);
    const root = screen.getByTestId('screen-checks');
    expect(within(root).getByRole('heading', { level: 1 }).textContent).toBe('Check kit');
    expect(checkList).toHaveLength(CHECK_NAMES.length);
    for (const def of checkList) {
      const link = screen.getByTestId(`check-link-${def.name}`);
      expect(link.getAttribute('href')).toBe(`/checks/${def.name}`);
      expect(link.textContent).toContain(def.title);
      expect(link.textContent).toContain(def.summary);
      expect(link.textContent).toContain(`Holds when ${def.condition}`);
    }
  });

  it('lists the starter worksheets under their own heading, after progress', async () => {
    mockFetch({ '/api/worksheets': () => jsonResponse(200, { worksheets }) });
    renderWithProviders(<CheckListScreen />);
    expect(screen.getByRole('heading', { level: 2, name: 'Worksheets' })).toBeTruthy();
    expect(screen.getByTestId('worksheets-loading')).toBeTruthy();
    const link = await screen.findByTestId('worksheet-link-photon-sheet');
    expect(link.getAttribute('href')).toBe('/worksheets/photon-sheet');
    expect(link.textContent).toContain('Photon bound by hand');
    expect(screen.getByTestId('worksheet-link-heat-engine').getAttribute('href')).toBe('/worksheets/heat-engine');
  });

  it('says what to do when there are no worksheets, and when they cannot be fetched', async () => {
    mockFetch({ '/api/worksheets': () => jsonResponse(200, { worksheets: [] }) });
    const { unmount } = renderWithProviders(<CheckListScreen />);
    expect((await screen.findByTestId('worksheets-empty')).textContent).toContain('content/worksheets/');
    unmount();

    mockFetch({ '/api/worksheets': () => jsonResponse(500, { error: { code: 'internal', message: 'It broke.' } }) });
    renderWithProviders(<CheckListScreen />);
    expect((await screen.findByTestId('worksheets-error')).textContent).toContain('It broke.');
    // The checks do not depend on the server.
    expect(screen.getByTestId('check-link-photon-bound')).toBeTruthy();
  });
});
