import { BAR_MAX, barSectionsFor, isInSection, sections, sectionsFor } from './sections';

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

describe('the bottom bar', () => {
  const roles = ['reader', 'contributor', 'editor', 'moderator', 'admin'] as const;

  it.each(roles)('holds five destinations at most for a %s, and together with "More" every section the role is offered', (role) => {
    const { bar, more } = barSectionsFor(role);
    expect(bar.length + (more.length > 0 ? 1 : 0)).toBeLessThanOrEqual(BAR_MAX);
    expect(BAR_MAX).toBe(5);
    expect([...bar, ...more].map((s) => s.key)).toEqual(sectionsFor(role).map((s) => s.key));
    // "More" only when something does not fit, and never for a single section.
    expect(more.length === 0 || more.length >= 2).toBe(true);
  });

  it('gives every section a short label of one word for the bar', () => {
    for (const section of sections) {
      expect(section.short).toMatch(/^\S+$/);
      expect(section.short.length).toBeLessThanOrEqual(8);
    }
  });

  it('puts an admin\'s last three sections behind "More"', () => {
    expect(barSectionsFor('admin').more.map((s) => s.key)).toEqual(['queue', 'admin', 'account']);
    expect(barSectionsFor('reader').more).toEqual([]);
  });
});
