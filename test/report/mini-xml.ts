/**
 * A deliberately strict, tiny XML reader for tests: elements, attributes, text, comments and the
 * XML declaration, the five predefined entities and numeric character references. It throws on
 * anything not well-formed (unclosed or crossed tags, a raw '<' or '&' where it may not be, an
 * unknown entity, duplicate attributes, characters XML 1.0 forbids, trailing content).
 */

export interface XmlElement {
  name: string;
  attributes: Record<string, string>;
  children: XmlElement[];
  /** decoded text directly inside this element */
  text: string;
}

export function parseXml(source: string): XmlElement {
  let i = 0;
  const fail = (why: string): never => {
    throw new Error(`not well-formed XML at offset ${i}: ${why}`);
  };
  for (const ch of source) {
    const c = ch.codePointAt(0) as number;
    const allowed = c === 0x9 || c === 0xa || c === 0xd || (c >= 0x20 && c <= 0xd7ff) || (c >= 0xe000 && c <= 0xfffd) || c >= 0x10000;
    if (!allowed) fail(`forbidden character U+${c.toString(16)}`);
  }
  const isSpace = (ch: string | undefined) => ch === ' ' || ch === '\n' || ch === '\t' || ch === '\r';
  const isNameChar = (ch: string | undefined) =>
    ch !== undefined && !isSpace(ch) && !'<>/=\'"&!?'.includes(ch);
  const skipSpace = () => {
    while (isSpace(source[i])) i++;
  };
  const expect = (s: string) => {
    if (!source.startsWith(s, i)) fail(`expected ${JSON.stringify(s)}`);
    i += s.length;
  };
  const readName = () => {
    const start = i;
    while (isNameChar(source[i])) i++;
    if (i === start) fail('expected a name');
    return source.slice(start, i);
  };
  const decode = (raw: string, inAttribute: boolean) => {
    let out = '';
    for (let k = 0; k < raw.length; k++) {
      const ch = raw[k] as string;
      if (ch === '<') fail('raw < in text or attribute');
      if (inAttribute && (ch === '\n' || ch === '\t' || ch === '\r')) {
        // Attribute-value normalisation: a literal newline or tab reads back as a space.
        out += ' ';
        continue;
      }
      if (ch !== '&') {
        out += ch;
        continue;
      }
      const end = raw.indexOf(';', k);
      if (end < 0) fail('unterminated entity');
      const name = raw.slice(k + 1, end);
      const named: Record<string, string> = { amp: '&', lt: '<', gt: '>', quot: '"', apos: "'" };
      if (name in named) out += named[name];
      else if (name.startsWith('#x')) out += String.fromCodePoint(Number.parseInt(name.slice(2), 16));
      else if (name.startsWith('#')) out += String.fromCodePoint(Number.parseInt(name.slice(1), 10));
      else fail(`unknown entity &${name};`);
      k = end;
    }
    return out;
  };
  const skipMisc = () => {
    for (;;) {
      skipSpace();
      if (source.startsWith('<!--', i)) {
        const end = source.indexOf('-->', i);
        if (end < 0) fail('unterminated comment');
        i = end + 3;
      } else return;
    }
  };
  const readElement = (): XmlElement => {
    expect('<');
    const name = readName();
    const attributes: Record<string, string> = {};
    for (;;) {
      const before = i;
      skipSpace();
      if (source.startsWith('/>', i)) {
        i += 2;
        return { name, attributes, children: [], text: '' };
      }
      if (source[i] === '>') {
        i++;
        break;
      }
      if (i === before) fail('expected space between attributes');
      const key = readName();
      skipSpace();
      expect('=');
      skipSpace();
      const quote = source[i];
      if (quote !== '"' && quote !== "'") fail('attribute value not quoted');
      const end = source.indexOf(quote as string, i + 1);
      if (end < 0) fail('unterminated attribute value');
      if (key in attributes) fail(`duplicate attribute ${key}`);
      attributes[key] = decode(source.slice(i + 1, end), true);
      i = end + 1;
    }
    const children: XmlElement[] = [];
    let text = '';
    for (;;) {
      if (i >= source.length) fail(`unclosed <${name}>`);
      if (source.startsWith('</', i)) {
        i += 2;
        const closing = readName();
        if (closing !== name) fail(`</${closing}> closes <${name}>`);
        skipSpace();
        expect('>');
        return { name, attributes, children, text };
      }
      if (source.startsWith('<!--', i)) {
        skipMisc();
        continue;
      }
      if (source[i] === '<') {
        children.push(readElement());
        continue;
      }
      const next = source.indexOf('<', i);
      const end = next < 0 ? source.length : next;
      const raw = source.slice(i, end);
      if (raw.includes(']]>')) fail(']]> in text');
      text += decode(raw, false);
      i = end;
    }
  };

  if (source.startsWith('<?xml', 0)) {
    const end = source.indexOf('?>');
    if (end < 0) fail('unterminated XML declaration');
    i = end + 2;
  }
  skipMisc();
  const root = readElement();
  skipMisc();
  if (i !== source.length) fail('content after the root element');
  return root;
}

/** Every element named `name` below `root`, depth first. */
export function elementsNamed(root: XmlElement, name: string): XmlElement[] {
  const out: XmlElement[] = [];
  const walk = (e: XmlElement) => {
    if (e.name === name) out.push(e);
    e.children.forEach(walk);
  };
  walk(root);
  return out;
}
