import { fireEvent, screen } from '@testing-library/react';
import { renderWithProviders } from '../testing/render';
import { deferred } from './deferred';

// The deferred chunk as a stand-in: the first fetch fails (a dropped connection), the next succeeds.
let mockFetches = 0;
jest.mock('./screens', () => {
  mockFetches += 1;
  if (mockFetches === 1) throw new Error('Failed to fetch the chunk');
  const { createElement } = require('react');
  const { Text } = require('react-native');
  return { SignInScreen: ({ email }: { email: string }) => createElement(Text, { testID: 'stand-in' }, `sign in as ${email}`) };
});

describe('deferred', () => {
  it('shows a neutral loading line, then says when the chunk could not be fetched, then loads it on request', async () => {
    // React reports the error the boundary catches; expected here.
    const logged = jest.spyOn(console, 'error').mockImplementation(() => {});
    const SignIn = deferred('SignInScreen');
    renderWithProviders(<SignIn email="reader@example.org" />);
    // While the chunk is on its way: the loading line, no error.
    expect(screen.getByTestId('deferred-loading').textContent).toContain('Loading…');
    expect(screen.queryByTestId('deferred-failed')).toBeNull();

    expect((await screen.findByTestId('deferred-failed')).textContent).toContain('could not be loaded');
    fireEvent.click(screen.getByTestId('deferred-retry'));
    expect((await screen.findByTestId('stand-in')).textContent).toBe('sign in as reader@example.org');
    expect(screen.queryByTestId('deferred-failed')).toBeNull();
    expect(mockFetches).toBe(2);
    logged.mockRestore();
  });
});
