// Characters XML 1.0 does not allow at all (C0 controls other than tab, LF, CR; lone surrogates; U+FFFE/F).
const FORBIDDEN = /[\u0000-\u0008\u000b\u000c\u000e-\u001f\ufffe\uffff]|[\ud800-\udbff](?![\udc00-\udfff])|(?<![\ud800-\udbff])[\udc00-\udfff]/g;
const ENTITY: Readonly<Record<string, string>> = { '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&apos;' };

/**
 * Text made safe for XML character data and attribute values (XML 1.0 §2.4, §3.3.3): the five
 * markup characters become entity references, and characters XML cannot hold at all are
 * replaced by U+FFFD (so a user's title never breaks the document).
 *
 * @param text any string
 * @example escapeXml(`<script>&"'`) // '&lt;script&gt;&amp;&quot;&apos;'
 */
export function escapeXml(text: string): string {
  return text.replace(FORBIDDEN, '\ufffd').replace(/[&<>"']/g, (c) => ENTITY[c]);
}
