/**
 * Layout rules of the review document, checked in the page itself (run by page.evaluate in
 * Chromium, so each function is self-contained: no imports, no closures).
 */

/** A line break inside a word: the text before the break ends in a letter or digit and the next line goes on with one. */
export interface TokenBreak {
  text: string;
  at: number;
}

/**
 * Every in-token break in table cells, figure captions and lists: a break between two
 * characters neither of which is a space, and where the first is not a hyphen or slash
 * (the places an id or a path may break). Line boxes are found from each character's rect.
 */
export function findTokenBreaks(rootSelector: string): TokenBreak[] {
  const out: { text: string; at: number }[] = [];
  const roots = Array.from(document.querySelectorAll(rootSelector));
  const range = document.createRange();
  for (const root of roots) {
    const walker = document.createTreeWalker(root, NodeFilter.SHOW_TEXT | NodeFilter.SHOW_ELEMENT);
    // the characters of one block in order, with their line tops, across its text nodes
    let chars: { ch: string; top: number; left: number }[] = [];
    let block: Element | null = null;
    const flush = () => {
      for (let i = 1; i < chars.length; i++) {
        const a = chars[i - 1]!;
        const b = chars[i]!;
        if (b.top > a.top + 2 && b.left < a.left) {
          const ok = /\s/.test(a.ch) || /\s/.test(b.ch) || a.ch === '-' || a.ch === '/' || a.ch === '\u2013';
          if (!ok) out.push({ text: chars.slice(Math.max(0, i - 12), i).map((c) => c.ch).join('') + '|' + chars.slice(i, i + 8).map((c) => c.ch).join(''), at: i });
        }
      }
      chars = [];
    };
    for (let node = walker.nextNode(); node; node = walker.nextNode()) {
      // a forced break (<br>) ends the run of characters
      if (node.nodeName === 'BR') {
        chars.push({ ch: ' ', top: chars.at(-1)?.top ?? 0, left: 0 });
        continue;
      }
      // list items run on in print (notes as one paragraph): an item boundary is a word boundary
      if (node.nodeName === 'LI') chars.push({ ch: ' ', top: chars.at(-1)?.top ?? 0, left: 0 });
      if (node.nodeType !== Node.TEXT_NODE) continue;
      const parent = node.parentElement;
      if (!parent || parent.closest('svg')) continue;
      // one block at a time: a break between blocks (table cells, list items, <br>) is no token break
      let b: Element | null = parent;
      while (b && getComputedStyle(b).display.startsWith('inline')) b = b.parentElement;
      if (b !== block) {
        flush();
        block = b;
      }
      const text = node.textContent ?? '';
      for (let i = 0; i < text.length; i++) {
        range.setStart(node, i);
        range.setEnd(node, i + 1);
        const rects = range.getClientRects();
        const r = rects[0];
        if (!r || r.width === 0) {
          // a <br> or a collapsed space between lines: the break there is allowed
          chars.push({ ch: ' ', top: chars.at(-1)?.top ?? 0, left: chars.at(-1)?.left ?? 0 });
          continue;
        }
        chars.push({ ch: text[i]!, top: r.top, left: r.left });
      }
    }
    flush();
  }
  return out;
}

/** Cells and pills whose content runs past their box. */
export function findOverflows(rootSelector: string): string[] {
  const out: string[] = [];
  for (const cell of Array.from(document.querySelectorAll(`${rootSelector} td, ${rootSelector} th`))) {
    const el = cell as HTMLElement;
    const where = `${el.closest('table')?.className ?? ''}`;
    if (el.scrollWidth > el.clientWidth + 1) out.push(`${where}: ${el.tagName} "${(el.textContent ?? '').trim().slice(0, 40)}" ${el.scrollWidth} > ${el.clientWidth}`);
    const box = el.getBoundingClientRect();
    for (const child of Array.from(el.querySelectorAll('.verdict, .flag, svg'))) {
      const r = child.getBoundingClientRect();
      if (r.right > box.right + 0.5 || r.left < box.left - 0.5) out.push(`${where}: ${child.className.toString()} in "${(el.textContent ?? '').trim().slice(0, 30)}" runs ${Math.round(r.right - box.right)} px past its cell`);
    }
  }
  for (const table of Array.from(document.querySelectorAll(`${rootSelector} table`))) {
    const t = table as HTMLElement;
    const column = t.parentElement?.getBoundingClientRect();
    const r = t.getBoundingClientRect();
    if (column && r.right > column.right + 1) out.push(`table ${t.className} (${t.closest('section')?.className ?? ''}) runs ${Math.round(r.right - column.right)} px past the column`);
  }
  return out;
}

/** Pairs of chart labels (SVG text) whose boxes overlap, and labels over a marker (class "mark"). */
export function findLabelCollisions(rootSelector: string): string[] {
  const out: string[] = [];
  for (const svg of Array.from(document.querySelectorAll(`${rootSelector} svg`))) {
    const labels = Array.from(svg.querySelectorAll('text')).map((t) => ({ t, r: t.getBoundingClientRect() })).filter((x) => x.r.width > 0);
    const svgBox = svg.getBoundingClientRect();
    const overlap = (a: DOMRect, b: DOMRect, pad = 0.5) => a.left < b.right - pad && b.left < a.right - pad && a.top < b.bottom - pad && b.top < a.bottom - pad;
    for (let i = 0; i < labels.length; i++) {
      const a = labels[i]!;
      if (a.r.left < svgBox.left - 0.5 || a.r.right > svgBox.right + 0.5) out.push(`${svg.getAttribute('class')}: "${a.t.textContent}" cut at the edge`);
      for (let j = i + 1; j < labels.length; j++) {
        const b = labels[j]!;
        if (overlap(a.r, b.r)) out.push(`${svg.getAttribute('class')}: "${a.t.textContent}" overlaps "${b.t.textContent}"`);
      }
      for (const m of Array.from(svg.querySelectorAll('.mark'))) {
        if (overlap(a.r, m.getBoundingClientRect(), 1)) out.push(`${svg.getAttribute('class')}: "${a.t.textContent}" covers a marker`);
      }
    }
  }
  return out;
}
