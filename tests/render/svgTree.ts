/**
 * A minimal XML reader for the renderer's own output: enough to walk elements, read
 * attributes and text, and to fail loudly on anything that is not well-formed.
 */

export interface Node {
  name: string;
  attrs: Record<string, string>;
  children: Node[];
  text: string;
  parent?: Node;
}

const ENTITIES: Record<string, string> = { amp: '&', lt: '<', gt: '>', quot: '"', apos: "'" };

export function decode(s: string): string {
  return s.replace(/&(#x[0-9a-f]+|#\d+|\w+);/gi, (m, e: string) => {
    if (e[0] === '#') return String.fromCodePoint(e[1] === 'x' || e[1] === 'X' ? parseInt(e.slice(2), 16) : parseInt(e.slice(1), 10));
    if (!(e in ENTITIES)) throw new Error(`unknown entity ${m}`);
    return ENTITIES[e];
  });
}

export function parseSvg(src: string): Node {
  const root: Node = { name: '#document', attrs: {}, children: [], text: '' };
  let cur = root;
  const re = /<(\/?)([A-Za-z][\w:.-]*)((?:\s+[\w:.-]+="[^"<]*")*)\s*(\/?)>|([^<]+)/gy;
  let m: RegExpExecArray | null;
  let pos = 0;
  while (pos < src.length) {
    re.lastIndex = pos;
    m = re.exec(src);
    if (!m) throw new Error(`not well-formed at ${pos}: ${src.slice(pos, pos + 40)}`);
    pos = re.lastIndex;
    if (m[5] !== undefined) {
      cur.text += decode(m[5]);
      continue;
    }
    const [, closing, name, attrText, selfClosing] = m;
    if (closing) {
      if (cur.name !== name) throw new Error(`mismatched </${name}> closing <${cur.name}>`);
      cur = cur.parent as Node;
      continue;
    }
    const attrs: Record<string, string> = {};
    for (const a of attrText.matchAll(/([\w:.-]+)="([^"]*)"/g)) {
      if (a[1] in attrs) throw new Error(`duplicate attribute ${a[1]}`);
      attrs[a[1]] = decode(a[2]);
    }
    const node: Node = { name, attrs, children: [], text: '', parent: cur };
    cur.children.push(node);
    if (!selfClosing) cur = node;
  }
  if (cur !== root) throw new Error(`unclosed <${cur.name}>`);
  if (root.children.length !== 1 || root.children[0].name !== 'svg') throw new Error('expected one <svg> root');
  return root.children[0];
}

export function all(node: Node, pred: (n: Node) => boolean, out: Node[] = []): Node[] {
  if (pred(node)) out.push(node);
  for (const c of node.children) all(c, pred, out);
  return out;
}

export function byClass(node: Node, cls: string): Node[] {
  return all(node, (n) => (n.attrs.class ?? '').split(/\s+/).includes(cls));
}

export function textOf(node: Node): string {
  return node.text + node.children.map(textOf).join('');
}

/** Absolute points of a path made of M/L/H/V/h/v commands (what the renderer emits for lines). */
export function pathPoints(d: string): { x: number; y: number; move: boolean }[] {
  const pts: { x: number; y: number; move: boolean }[] = [];
  let x = 0;
  let y = 0;
  for (const [, cmd, args] of d.matchAll(/([MLHVhvlmZz])([^MLHVhvlmZzACac]*)/g)) {
    const n = args.split(/[\s,]+/).filter(Boolean).map(Number);
    switch (cmd) {
      case 'M':
      case 'L':
        for (let i = 0; i + 1 < n.length; i += 2) {
          x = n[i];
          y = n[i + 1];
          pts.push({ x, y, move: cmd === 'M' && i === 0 });
        }
        break;
      case 'm':
      case 'l':
        for (let i = 0; i + 1 < n.length; i += 2) {
          x += n[i];
          y += n[i + 1];
          pts.push({ x, y, move: cmd === 'm' && i === 0 });
        }
        break;
      case 'H':
        x = n[0];
        pts.push({ x, y, move: false });
        break;
      case 'V':
        y = n[0];
        pts.push({ x, y, move: false });
        break;
      case 'h':
        x += n[0];
        pts.push({ x, y, move: false });
        break;
      case 'v':
        y += n[0];
        pts.push({ x, y, move: false });
        break;
      default:
        break;
    }
  }
  return pts;
}

/** A linear map value → pixel recovered from an axis' tick labels (display units). */
export function axisMap(svg: Node, axisClass: 'sl-axis-x' | 'sl-axis-y'): (value: number) => number {
  const axis = byClass(svg, axisClass)[0];
  const ticks = all(axis, (n) => n.name === 'text' && n.attrs['data-tick'] !== undefined).map((t) => ({
    v: Number(t.attrs['data-tick'].replace(/−/g, '-').replace(/,/g, '')),
    p: axisClass === 'sl-axis-x' ? Number(t.attrs.x) : Number(t.attrs.y) - 4,
  }));
  if (ticks.length < 2) throw new Error('axis has fewer than two ticks');
  const a = ticks[0];
  const b = ticks[ticks.length - 1];
  const slope = (b.p - a.p) / (b.v - a.v);
  return (value: number) => a.p + (value - a.v) * slope;
}
