import { describe, expect, it } from 'vitest';
import { renderMarkdown } from '../../src/report/markdown.js';

describe('renderMarkdown', () => {
  it('prints raw HTML as text', () => {
    const html = renderMarkdown('Note <script>alert(1)</script> and <img src=x onerror=alert(1)>');
    expect(html).not.toMatch(/<script|<img/i);
    expect(html).toContain('&lt;script&gt;alert(1)&lt;/script&gt;');
    expect(html).toContain('&lt;img src=x onerror=alert(1)&gt;');
  });

  it('renders no live link and no image', () => {
    const html = renderMarkdown('See [the plan](https://example.invalid/plan) and ![chart](https://example.invalid/c.png) and <https://example.invalid/a>.');
    expect(html).not.toMatch(/<a\b|<img\b|href=|src=/i);
    expect(html).toContain('the plan</span> <span class="link-address">(https://example.invalid/plan)</span>');
  });

  it('leaves bare addresses as plain text (linkify off)', () => {
    expect(renderMarkdown('https://example.invalid/x')).toBe('<p>https://example.invalid/x</p>\n');
  });

  it('keeps ordinary emphasis and code', () => {
    expect(renderMarkdown('**Level 1** and `zeta`')).toBe('<p><strong>Level 1</strong> and <code>zeta</code></p>\n');
  });
});
