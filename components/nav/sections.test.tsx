import { isInSection, sections, sectionsFor } from './sections';

describe('the Check kit section', () => {
  it('comes right after Claim check, for every role', () => {
    for (const role of ['reader', 'contributor', 'editor', 'moderator', 'admin'] as const) {
      const keys = sectionsFor(role).map((s) => s.key);
      expect(keys[keys.indexOf('check') + 1]).toBe('checks');
    }
    expect(sections.find((s) => s.key === 'checks')).toMatchObject({ href: '/checks', label: 'Check kit' });
  });

  it('holds the check screens, and Claim check does not take them for its own', () => {
    const kit = sections.find((s) => s.key === 'checks')!;
    const claim = sections.find((s) => s.key === 'check')!;
    expect(isInSection('/checks', kit)).toBe(true);
    expect(isInSection('/checks/photon-bound', kit)).toBe(true);
    expect(isInSection('/checks/photon-bound', claim)).toBe(false);
    expect(isInSection('/check', kit)).toBe(false);
  });
});

describe('the Library section', () => {
  it('holds the home and every entry page, and nothing else', () => {
    const library = sections.find((s) => s.key === 'library')!;
    expect(isInSection('/', library)).toBe(true);
    expect(isInSection('/entries/light-in-a-box/v/2', library)).toBe(true);
    expect(isInSection('/desk', library)).toBe(false);
  });
});
