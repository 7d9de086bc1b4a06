// A strict, small XML reader for the plot tests (no dependency): it accepts exactly the
// well-formed subset of XML 1.0 an SVG figure uses — an optional XML declaration, comments,
// elements with quoted attributes, character data with the five predefined entities and
// numeric character references — and throws on anything else (unclosed or mismatched tags,
// a duplicate attribute, a raw `<` or a bare `&`, text outside the root, two roots).

export interface XmlElement {
  name: string;
  attrs: Record<string, string>;
  children: XmlElement[];
  /** the element's own character data, entities decoded (children's text not included) */
  text: string;
}

const NAME = /[A-Za-z_:][A-Za-z0-9_.:-]*/y;
const ENTITIES: Record<string, string> = { amp: '&', lt: '<', gt: '>', quot: '"', apos: "'" };

function decode(raw: string, where: number): string {
  return raw.replace(/&([^;&<]*);|&/g, (match, body: string | undefined) => {
    if (body === undefined) throw new SyntaxError(`bare '&' near offset ${where}`);
    if (body in ENTITIES) return ENTITIES[body];
    const num = /^#(\d+)$/.exec(body) ?? /^#x([0-9a-fA-F]+)$/.exec(body);
    if (num) return String.fromCodePoint(parseInt(num[1], body[1] === 'x' ? 16 : 10));
    throw new SyntaxError(`unknown entity '${match}' near offset ${where}`);
  });
}

/** Parses a whole document; returns its root element. */
export function parseXml(text: string): XmlElement {
  let i = 0;
  const fail = (why: string): never => {
    throw new SyntaxError(`${why} at offset ${i}: ${JSON.stringify(text.slice(i, i + 40))}`);
  };
  const skipSpace = () => {
    while (i < text.length && /\s/.test(text[i])) i++;
  };
  const name = (): string => {
    NAME.lastIndex = i;
    const m = NAME.exec(text);
    if (!m) fail('expected a name');
    i += m![0].length;
    return m![0];
  };
  const skipMisc = () => {
    for (;;) {
      skipSpace();
      if (text.startsWith('<!--', i)) {
        const end = text.indexOf('-->', i + 4);
        if (end < 0) fail('unterminated comment');
        if (text.slice(i + 4, end).includes('--')) fail("'--' inside a comment");
        i = end + 3;
      } else return;
    }
  };
  if (text.startsWith('<?xml', 0)) {
    const end = text.indexOf('?>');
    if (end < 0) fail('unterminated XML declaration');
    if (!/^<\?xml version="1\.[0-9]"( encoding="[A-Za-z0-9._-]+")?( standalone="(yes|no)")?\s*$/.test(text.slice(0, end))) fail('malformed XML declaration');
    i = end + 2;
  }
  skipMisc();
  const element = (): XmlElement => {
    if (text[i] !== '<') fail("expected '<'");
    i++;
    const el: XmlElement = { name: name(), attrs: {}, children: [], text: '' };
    for (;;) {
      const before = i;
      skipSpace();
      if (text.startsWith('/>', i)) {
        i += 2;
        return el;
      }
      if (text[i] === '>') {
        i++;
        break;
      }
      if (i === before) fail('expected whitespace before an attribute');
      const key = name();
      skipSpace();
      if (text[i] !== '=') fail(`expected '=' after attribute ${key}`);
      i++;
      skipSpace();
      const quote = text[i];
      if (quote !== '"' && quote !== "'") fail(`attribute ${key} value is not quoted`);
      const end = text.indexOf(quote, i + 1);
      if (end < 0) fail(`unterminated value of attribute ${key}`);
      const raw = text.slice(i + 1, end);
      if (raw.includes('<')) fail(`raw '<' in attribute ${key}`);
      if (key in el.attrs) fail(`duplicate attribute ${key}`);
      el.attrs[key] = decode(raw, i);
      i = end + 1;
    }
    for (;;) {
      const lt = text.indexOf('<', i);
      if (lt < 0) fail(`element <${el.name}> is not closed`);
      const raw = text.slice(i, lt);
      if (raw.includes(']]>')) fail("']]>' in character data");
      el.text += decode(raw, i);
      i = lt;
      if (text.startsWith('</', i)) {
        i += 2;
        const closing = name();
        if (closing !== el.name) fail(`</${closing}> closes <${el.name}>`);
        skipSpace();
        if (text[i] !== '>') fail("expected '>'");
        i++;
        return el;
      }
      if (text.startsWith('<!--', i)) {
        skipMisc();
        continue;
      }
      if (text.startsWith('<!', i) || text.startsWith('<?', i)) fail('unsupported markup');
      el.children.push(element());
    }
  };
  const root = element();
  skipMisc();
  if (i !== text.length) fail('content after the root element');
  return root;
}

/** Every element of a tree, depth first, the root included. */
export function allElements(root: XmlElement): XmlElement[] {
  const out: XmlElement[] = [];
  const walk = (e: XmlElement) => {
    out.push(e);
    e.children.forEach(walk);
  };
  walk(root);
  return out;
}

/** The elements with `name` whose class list holds `cls` (any class when cls is undefined). */
export function select(root: XmlElement, name: string, cls?: string): XmlElement[] {
  return allElements(root).filter((e) => e.name === name && (cls === undefined || (e.attrs.class ?? '').split(/\s+/).includes(cls)));
}

/** All character data under an element, children included, in document order. */
export function textOf(e: XmlElement): string {
  return e.text + e.children.map(textOf).join('');
}
