import { describe, expect, test } from 'vitest';
import { parseXml, textOf } from './plot-xml.js';

// The figures' well-formedness checks are only as good as this reader's strictness.
describe('parseXml(text) — the strict reader the plot tests rely on', () => {
  test('reads a small document: declaration, attributes, entities, nesting', () => {
    const root = parseXml('<?xml version="1.0" encoding="UTF-8"?>\n<svg a="1" b=\'x&amp;y\'><text>&lt;a&gt; &#8722;1</text><g/></svg>\n');
    expect(root.name).toBe('svg');
    expect(root.attrs).toEqual({ a: '1', b: 'x&y' });
    expect(textOf(root.children[0])).toBe('<a> \u22121');
    expect(root.children[1].name).toBe('g');
  });
  test.each([
    { name: 'unclosed element', text: '<svg><g></svg>' },
    { name: 'mismatched tag', text: '<svg><g></h></svg>' },
    { name: 'bare ampersand', text: '<svg>a & b</svg>' },
    { name: 'raw < in text', text: '<svg>a < b</svg>' },
    { name: 'raw < in attribute', text: '<svg a="<"/>' },
    { name: 'unknown entity', text: '<svg>&nbsp;</svg>' },
    { name: 'duplicate attribute', text: '<svg a="1" a="2"/>' },
    { name: 'unquoted attribute', text: '<svg a=1/>' },
    { name: 'two roots', text: '<svg/><svg/>' },
    { name: 'text after the root', text: '<svg/>x' },
  ])('rejects $name', ({ text }) => {
    expect(() => parseXml(text)).toThrow(SyntaxError);
  });
});
