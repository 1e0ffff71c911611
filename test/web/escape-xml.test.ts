// escapeXml against the XML 1.0 specification (W3C, 5th edition): §2.4 says & and < must be
// escaped in character data, §3.1 that attribute values may not hold < or their own quote, §4.6
// lists the five predefined entities, §2.2 the characters a document may hold at all.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { escapeXml } from '../../web/equal-area/escape-xml';

/** Reverses the five predefined entities (XML 1.0 §4.6), the reading an XML parser does. */
function unescapeXml(text: string): string {
  return text.replace(/&(amp|lt|gt|quot|apos);/g, (_, name: string) => ({ amp: '&', lt: '<', gt: '>', quot: '"', apos: "'" })[name] ?? '');
}

/** XML 1.0 §2.2 Char production. */
const XML_CHAR = /^[\t\n\r\u0020-\uD7FF\uE000-\uFFFD\u{10000}-\u{10FFFF}]*$/u;

describe('escapeXml', () => {
  it('turns an HTML injection in a slice name into inert text', () => {
    const escaped = escapeXml('<img src=x onerror=alert(1)>');
    expect(escaped).toBe('&lt;img src=x onerror=alert(1)&gt;');
    expect(escaped).not.toContain('<');
  });

  it('writes each of the five special characters as its predefined entity', () => {
    expect(escapeXml(`a&b<c>d"e'f`)).toBe('a&amp;b&lt;c&gt;d&quot;e&apos;f');
  });

  it('escapes an ampersand that already looks like an entity, so the text reads back unchanged', () => {
    expect(escapeXml('&amp;')).toBe('&amp;amp;');
  });

  it('replaces characters XML cannot hold (NUL, other C0 controls, lone surrogates) by U+FFFD', () => {
    expect(escapeXml('a\u0000b\u001Bc\uD800d\uDC00e')).toBe('a\uFFFDb\uFFFDc\uFFFDd\uFFFDe');
    expect(escapeXml('tab\tnewline\nreturn\r')).toBe('tab\tnewline\nreturn\r');
    expect(escapeXml('\u{1F98E} pair kept')).toBe('\u{1F98E} pair kept');
  });

  it('reads back as the original text for any string of allowed characters, and never holds a raw < " or \'', () => {
    fc.assert(fc.property(fc.string({ unit: 'binary' }), (text) => {
      const escaped = escapeXml(text);
      expect(escaped).not.toMatch(/[<>"']/);
      expect(escaped).toMatch(XML_CHAR);
      if (XML_CHAR.test(text)) expect(unescapeXml(escaped)).toBe(text);
    }), { seed: 11, numRuns: 300 });
  });
});
