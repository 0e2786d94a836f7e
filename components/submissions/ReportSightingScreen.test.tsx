import { act, fireEvent, screen, waitFor } from '@testing-library/react';
import * as DocumentPicker from 'expo-document-picker';
import { jsonResponse, mockFetch, renderWithProviders, setWindowWidth } from '../testing/render';
import { contributor, session, sighting, submissionResponse } from './fixtures';
import { ReportSightingScreen } from './ReportSightingScreen';

jest.mock('expo-router', () => require('../testing/expoRouter'));
jest.mock('expo-document-picker', () => ({ getDocumentAsync: jest.fn() }));
const pick = DocumentPicker.getDocumentAsync as jest.MockedFunction<typeof DocumentPicker.getDocumentAsync>;

beforeEach(() => {
  setWindowWidth(390);
  pick.mockReset();
});

const type = (id: string, text: string) => fireEvent.change(screen.getByTestId(id), { target: { value: text } });

/** A File of `size` bytes (its content does not matter to the form: the server reads the type from it). */
function fileOf(name: string, mediaType: string, size: number) {
  const file = new File([new Uint8Array(size)], name, { type: mediaType });
  return { name, size, mimeType: mediaType, uri: `blob:${name}`, lastModified: 0, file };
}

async function pickFiles(...assets: ReturnType<typeof fileOf>[]) {
  pick.mockResolvedValueOnce({ canceled: false, assets });
  await act(async () => {
    fireEvent.click(screen.getByTestId('sighting-pick-files'));
  });
}

function fillTheClaim() {
  type('sighting-title', 'Sealed cavity drive said to push with no exhaust');
  type('sighting-url', 'https://news.example.org/cavity-drive');
  type('sighting-summary', 'A press release claims thrust from microwaves in a closed cavity.');
}

describe('ReportSightingScreen', () => {
  it('tells a reader to sign in, and an unconfirmed account to confirm its address', async () => {
    mockFetch(session(null));
    const { unmount } = renderWithProviders(<ReportSightingScreen />);
    expect((await screen.findByTestId('sighting-sign-in')).getAttribute('href')).toBe('/sign-in?next=%2Freport');
    expect(screen.queryByTestId('sighting-submit')).toBeNull();
    unmount();

    mockFetch(session({ ...contributor, verified: false }));
    renderWithProviders(<ReportSightingScreen />);
    expect((await screen.findByTestId('sighting-unverified')).textContent).toContain('contributor@example.org');
    expect(screen.queryByTestId('sighting-submit')).toBeNull();
  });

  it('reads each figure live in SI, and says what is wrong with one', async () => {
    mockFetch(session(contributor));
    renderWithProviders(<ReportSightingScreen />);
    fireEvent.click(await screen.findByTestId('sighting-figure-add'));
    type('sighting-figure-0-quantity', '0.2 lbf');
    // 1 lbf = 4.448 221 615 260 5 N exactly (NIST SP 811, 2008, appendix B.8).
    const si = screen.getByTestId('sighting-figure-0-si');
    expect(Number(si.getAttribute('data-si'))).toBeCloseTo(0.2 * 4.4482216152605, 12);
    expect(si.textContent).toBe('889.6 mN');
    fireEvent.click(screen.getByTestId('sighting-figure-0-kind-power'));
    expect(screen.getByTestId('sighting-figure-0-quantity-error').textContent).toMatch(/\S/);
    expect(screen.queryByTestId('sighting-figure-0-si')).toBeNull();
    type('sighting-figure-0-quantity', '1.5 kW');
    expect(Number(screen.getByTestId('sighting-figure-0-si').getAttribute('data-si'))).toBe(1500);
  });

  it('lets a figure’s kind follow the unit typed until the reader picks one, and asks when the unit fits two', async () => {
    mockFetch(session(contributor));
    renderWithProviders(<ReportSightingScreen />);
    fireEvent.click(await screen.findByTestId('sighting-figure-add'));
    fireEvent.click(screen.getByTestId('sighting-figure-add'));
    const checked = (kind: string) => screen.getByTestId(`sighting-figure-1-kind-${kind}`).getAttribute('aria-checked');
    type('sighting-figure-1-quantity', '3');
    expect(checked('thrust')).toBe('true'); // a bare number changes nothing
    type('sighting-figure-1-quantity', '3 kW');
    expect(checked('power')).toBe('true');
    expect(Number(screen.getByTestId('sighting-figure-1-si').getAttribute('data-si'))).toBe(3000);
    type('sighting-figure-1-quantity', '12 N');
    expect(checked('thrust')).toBe('true');
    // A second is a duration or a specific impulse: the form says so and asks.
    type('sighting-figure-1-quantity', '300 s');
    expect(checked('duration')).toBe('true');
    expect(screen.getByTestId('sighting-figure-1-kind-question').textContent).toContain('specific impulse');
    // Once picked, the kind stays whatever is typed.
    fireEvent.click(screen.getByTestId('sighting-figure-1-kind-specific-impulse'));
    expect(screen.queryByTestId('sighting-figure-1-kind-question')).toBeNull();
    type('sighting-figure-1-quantity', '3 kW');
    expect(checked('specific-impulse')).toBe('true');
    // The first row was never typed in and kept its kind.
    expect(screen.getByTestId('sighting-figure-0-kind-thrust').getAttribute('aria-checked')).toBe('true');
  });

  it('checks the files before sending: too large, too many, removable', async () => {
    mockFetch(session(contributor));
    renderWithProviders(<ReportSightingScreen />);
    await screen.findByTestId('sighting-pick-files');
    await pickFiles(fileOf('big.pdf', 'application/pdf', 10 * 1024 * 1024 + 1), fileOf('photo.png', 'image/png', 300));
    expect(pick).toHaveBeenCalledWith(expect.objectContaining({ multiple: true, type: ['application/pdf', 'image/png', 'image/jpeg', 'image/webp'] }));
    expect(screen.getByTestId('sighting-file-0').textContent).toContain('big.pdf');
    expect(screen.getByTestId('sighting-file-0-error').textContent).toContain('at most 10.0 MB');
    expect(screen.queryByTestId('sighting-file-1-error')).toBeNull();
    await pickFiles(...[1, 2, 3, 4].map((n) => fileOf(`p${n}.jpg`, 'image/jpeg', 10)));
    expect(screen.getByTestId('sighting-files-error').textContent).toContain('6 files are picked; at most 5');
    fillTheClaim();
    const fetchMock = global.fetch as jest.Mock;
    const before = fetchMock.mock.calls.length;
    fireEvent.click(screen.getByTestId('sighting-submit'));
    expect(await screen.findByTestId('sighting-invalid')).toBeTruthy();
    expect(fetchMock.mock.calls.length).toBe(before);
    fireEvent.click(screen.getByTestId('sighting-file-0-remove'));
    expect(screen.getByTestId('sighting-file-0').textContent).toContain('photo.png');
    expect(screen.queryByTestId('sighting-files-error')).toBeNull();
    expect(screen.queryByTestId('sighting-invalid')).toBeNull();
  });

  it('sends the sighting as multipart with the CSRF token, and says it is in the queue', async () => {
    let sent: RequestInit | undefined;
    mockFetch({
      ...session(contributor),
      '/api/sightings': (init) => {
        sent = init;
        return jsonResponse(201, submissionResponse(sighting({ id: 77 })));
      },
    });
    renderWithProviders(<ReportSightingScreen />);
    await screen.findByTestId('sighting-title');
    fireEvent.click(screen.getByTestId('sighting-submit'));
    expect(screen.getByTestId('sighting-title-error')).toBeTruthy();
    expect(screen.getByTestId('sighting-url-error').textContent).toContain('Say where it was seen');
    fillTheClaim();
    type('sighting-citation', 'Invented Engineering Letters 12, 34 (2026)');
    fireEvent.click(screen.getByTestId('sighting-figure-add'));
    type('sighting-figure-0-quantity', '0.2 lbf');
    type('sighting-figure-0-label', 'claimed thrust');
    fireEvent.click(screen.getByTestId('sighting-figure-add'));
    await pickFiles(fileOf('release.pdf', 'application/pdf', 2048));
    fireEvent.click(screen.getByTestId('sighting-submit'));
    // An empty figure row is not sent silently: it asks to be filled in or removed.
    expect(screen.getByTestId('sighting-figure-1-quantity-error').textContent).toContain('remove this row');
    fireEvent.click(screen.getByTestId('sighting-figure-1-remove'));
    fireEvent.click(screen.getByTestId('sighting-submit'));
    await screen.findByTestId('sighting-done');
    expect(screen.getByTestId('sighting-done-link').getAttribute('href')).toBe('/submissions/77');

    expect(sent?.method).toBe('POST');
    expect((sent?.headers as Record<string, string>)['X-CSRF-Token']).toBe('csrf-for-tests');
    const body = sent?.body as FormData;
    expect(body).toBeInstanceOf(FormData);
    expect(body.get('title')).toBe('Sealed cavity drive said to push with no exhaust');
    expect(body.get('seenAtUrl')).toBe('https://news.example.org/cavity-drive');
    expect(body.get('seenAtCitation')).toBe('Invented Engineering Letters 12, 34 (2026)');
    expect(JSON.parse(String(body.get('figures')))).toEqual([{ kind: 'thrust', quantity: '0.2 lbf', label: 'claimed thrust' }]);
    const files = body.getAll('files') as File[];
    expect(files.map((f) => [f.name, f.size])).toEqual([['release.pdf', 2048]]);
  });

  it("puts the server's field errors beside the fields and files they name", async () => {
    mockFetch({
      ...session(contributor),
      '/api/sightings': () =>
        jsonResponse(415, {
          error: {
            code: 'unsupported_media_type',
            message: 'files.1 is not a PDF, PNG, JPEG or WebP file.',
            fields: { 'files.1': 'Its content is a ZIP archive, not a PDF, PNG, JPEG or WebP file.', 'body.figures.0.quantity': 'Not a thrust.' },
          },
        }),
    });
    renderWithProviders(<ReportSightingScreen />);
    await screen.findByTestId('sighting-title');
    fillTheClaim();
    fireEvent.click(screen.getByTestId('sighting-figure-add'));
    type('sighting-figure-0-quantity', '3 N');
    await pickFiles(fileOf('a.png', 'image/png', 10), fileOf('b.pdf', 'application/pdf', 10));
    fireEvent.click(screen.getByTestId('sighting-submit'));
    expect((await screen.findByTestId('sighting-file-1-error')).textContent).toContain('ZIP archive');
    expect(screen.queryByTestId('sighting-file-0-error')).toBeNull();
    expect(screen.getByTestId('sighting-figure-0-quantity-error').textContent).toBe('Not a thrust.');
    expect(screen.getByTestId('sighting-error')).toBeTruthy();
    await waitFor(() => expect(screen.queryByTestId('sighting-done')).toBeNull());
  });
});
