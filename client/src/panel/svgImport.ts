/// <reference lib="dom" />
/**
 * Brings diagram SVG text into the page without ever handing it to an HTML parser: it is
 * parsed as image/svg+xml, reduced to an allow-list of drawing elements and attributes
 * (no scripts, no event handlers, no external references), then imported as nodes.
 */

const SVG_NS = 'http://www.w3.org/2000/svg';

const ALLOWED_ELEMENTS = new Set([
  'svg', 'g', 'path', 'rect', 'circle', 'ellipse', 'line', 'polyline', 'polygon',
  'text', 'tspan', 'title', 'desc', 'use', 'defs', 'clipPath',
]);

function allowedAttribute(el: Element, attr: Attr): boolean {
  const name = attr.name.toLowerCase();
  if (name.startsWith('on') || name === 'style') return false;
  // Only same-document fragment references, as the renderer's hover copies use.
  if (name === 'href' || name === 'xlink:href') return el.localName === 'use' && /^#[\w-]+$/.test(attr.value);
  return true;
}

function sanitize(root: Element): void {
  const walker: Element[] = [root];
  while (walker.length > 0) {
    const el = walker.pop() as Element;
    for (const child of Array.from(el.children)) {
      if (child.namespaceURI !== SVG_NS || !ALLOWED_ELEMENTS.has(child.localName)) child.remove();
      else walker.push(child);
    }
    for (const attr of Array.from(el.attributes)) {
      if (!allowedAttribute(el, attr)) el.removeAttributeNode(attr);
    }
  }
}

/** The diagram as a node of `target`, or undefined when the text is not a well-formed SVG document. */
export function importSvg(target: Document, svgText: string): SVGSVGElement | undefined {
  // Cheap shape check first: text that is plainly not an SVG document never reaches the parser.
  if (!/^\s*(<\?xml[^>]*\?>\s*)?<svg[\s>]/.test(svgText) || !/<\/svg>\s*$/.test(svgText)) return undefined;
  const parsed = new DOMParser().parseFromString(svgText, 'image/svg+xml');
  const root = parsed.documentElement;
  if (!root || root.namespaceURI !== SVG_NS || root.localName !== 'svg') return undefined;
  if (parsed.getElementsByTagNameNS('*', 'parsererror').length > 0) return undefined;
  sanitize(root);
  return target.importNode(root, true) as unknown as SVGSVGElement;
}
