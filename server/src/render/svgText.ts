/**
 * Tiny, deterministic SVG text builder. Every string that reaches the output passes through
 * `escapeXml`, because labels come from users' setup files.
 */

/** Characters XML 1.0 forbids outright (C0 controls other than tab/LF/CR, U+FFFE/U+FFFF, lone surrogates). */
const INVALID_XML_CHARS = /[\u0000-\u0008\u000B\u000C\u000E-\u001F\uFFFE\uFFFF]|[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/g;

/** Escapes text for use in element content and in double- or single-quoted attributes. */
export function escapeXml(text: string): string {
  return String(text)
    .replace(INVALID_XML_CHARS, '\uFFFD')
    .replace(/&/g, '&amp;')
    .replace(/</g, '&lt;')
    .replace(/>/g, '&gt;')
    .replace(/"/g, '&quot;')
    .replace(/'/g, '&#39;');
}

/** Rounds a drawing coordinate to 2 decimals; keeps files small and output stable. */
export function px(v: number): string {
  const r = Math.round(v * 100) / 100;
  return String(Object.is(r, -0) ? 0 : r);
}

/** A data value for `data-*` attributes: 12 significant digits, enough for any read-out. */
export function dataNum(v: number): string {
  if (!Number.isFinite(v)) return 'NaN';
  const r = Number(v.toPrecision(12));
  return String(Object.is(r, -0) ? 0 : r);
}

export type AttrValue = string | number | undefined;
export type Attrs = Record<string, AttrValue>;

function attrText(attrs: Attrs): string {
  let out = '';
  for (const [name, value] of Object.entries(attrs)) {
    if (value === undefined) continue;
    const text = typeof value === 'number' ? px(value) : escapeXml(value);
    out += ` ${name}="${text}"`;
  }
  return out;
}

/** An element; `children` is already-built markup (use `text()` for character data). */
export function el(name: string, attrs: Attrs, children: string | string[] = ''): string {
  const body = Array.isArray(children) ? children.join('') : children;
  return body === '' ? `<${name}${attrText(attrs)}/>` : `<${name}${attrText(attrs)}>${body}</${name}>`;
}

/** Escaped character data. */
export function text(content: string): string {
  return escapeXml(content);
}

/** A `<title>` child, the accessible name and native tooltip of a data element. */
export function titleEl(content: string): string {
  return `<title>${escapeXml(content)}</title>`;
}

/** FNV-1a 32-bit hash, used to make element ids unique per diagram yet deterministic. */
export function shortHash(input: string): string {
  let h = 0x811c9dc5;
  for (let i = 0; i < input.length; i++) {
    h ^= input.charCodeAt(i);
    h = Math.imul(h, 0x01000193) >>> 0;
  }
  return h.toString(36);
}
