/**
 * Text made safe for XML character data and attribute values (SVG figures). The five
 * predefined entities are written for & < > " ' (XML 1.0 §2.4, §4.6); characters XML 1.0 cannot
 * hold at all (C0 controls other than tab, line feed and carriage return; U+FFFE, U+FFFF; lone
 * surrogates, §2.2) become U+FFFD, so a hostile name cannot break the document.
 */
const ENTITIES: Readonly<Record<string, string>> = { '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&apos;' };

const SPECIAL = /[&<>"']/g;
const NOT_XML = /[\u0000-\u0008\u000B\u000C\u000E-\u001F\uFFFE\uFFFF]|[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/g;

export function escapeXml(text: string): string {
  return text.replace(NOT_XML, '\uFFFD').replace(SPECIAL, (c) => ENTITIES[c]);
}
