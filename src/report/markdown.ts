/**
 * Markdown for criteria notes. Notes come from criteria files anyone can edit, so raw HTML is
 * off (tags print as text), images are off (they would be an external load) and links are
 * printed as their text followed by the address, never as something a reader can click
 * into or the browser can fetch.
 */
import MarkdownIt, { type MarkdownIt as MarkdownParser } from 'markdown-it';

function createMarkdown(): MarkdownParser {
  const md = new MarkdownIt({ html: false, linkify: false, typographer: false });
  md.disable(['image']);
  md.renderer.rules.link_open = () => '<span class="link-text">';
  md.renderer.rules.link_close = (tokens, idx) => {
    // The matching link_open is the nearest earlier one at the same nesting level.
    let href = '';
    for (let i = idx - 1; i >= 0; i--) {
      const t = tokens[i];
      if (t && t.type === 'link_open') {
        href = String(t.attrGet('href') ?? '');
        break;
      }
    }
    return href ? `</span> <span class="link-address">(${md.utils.escapeHtml(href)})</span>` : '</span>';
  };
  return md;
}

const markdown = createMarkdown();

/** Markdown to an HTML fragment that contains no raw HTML, no image and no live link. */
export function renderMarkdown(source: string): string {
  return markdown.render(source);
}
