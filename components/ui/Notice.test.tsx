import { render, screen } from '@testing-library/react';
import { Notice, toneOf, type NoticeTone } from './Notice';
import { ErrorNotice } from './ErrorNotice';
import { ApiError } from '../http/client';

const tones: NoticeTone[] = ['success', 'empty', 'warning', 'error'];

describe('Notice', () => {
  it.each([
    ['success', 'Done', 'status'],
    ['empty', 'Nothing here yet', null],
    ['warning', 'Note', null],
    ['error', 'Problem', 'alert'],
  ] as const)('a %s notice says "%s" before its title and has role %s', (tone, word, role) => {
    render(<Notice tone={tone} testID="n" title="The title." />);
    const notice = screen.getByTestId('n');
    expect(notice.getAttribute('data-tone')).toBe(tone);
    expect(notice.getAttribute('role')).toBe(role);
    expect(screen.getByTestId('n-tone').textContent).toBe(`${word}: `);
    expect(notice.textContent).toBe(`${word}: The title.`);
  });

  it('draws a different mark for each tone (not colour alone)', () => {
    const marks = tones.map((tone) => {
      const { container, unmount } = render(<Notice tone={tone} title="t" />);
      const svg = container.querySelector(`[data-testid="notice-mark-${tone}"]`);
      expect(svg).not.toBeNull();
      const shape = svg!.innerHTML.replace(/(stroke|fill)="[^"]*"/g, '');
      unmount();
      return shape;
    });
    expect(new Set(marks).size).toBe(tones.length);
  });

  it('is an error when it is an alert and no tone is given, a warning otherwise', () => {
    expect(toneOf(undefined, 'alert')).toBe('error');
    expect(toneOf(undefined, undefined)).toBe('warning');
    expect(toneOf('empty', undefined)).toBe('empty');
    render(<Notice role="alert" testID="n" title="Failed." />);
    expect(screen.getByTestId('n').getAttribute('data-tone')).toBe('error');
  });

  it('keeps an error an alert and a success a status whatever role is asked for', () => {
    const { unmount } = render(<Notice tone="error" role="status" testID="n" title="t" />);
    expect(screen.getByTestId('n').getAttribute('role')).toBe('alert');
    unmount();
    render(<Notice tone="success" role="alert" testID="n" title="t" />);
    expect(screen.getByTestId('n').getAttribute('role')).toBe('status');
  });
});

describe('ErrorNotice', () => {
  it('is an error notice', () => {
    render(<ErrorNotice testID="e" error={new ApiError(500, 'internal', 'It broke.')} what="the list" onRetry={() => {}} />);
    expect(screen.getByTestId('e').getAttribute('data-tone')).toBe('error');
    expect(screen.getByTestId('e').getAttribute('role')).toBe('alert');
  });
});
