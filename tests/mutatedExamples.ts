/** Shared fast-check arbitrary: example files with the edits a typing user makes. */
import fc from 'fast-check';

/** Insertions, deletions, duplications and replacements (with scrambled characters) at random places. */
export function mutatedText(seeds: readonly string[], maxEdits: number): fc.Arbitrary<string> {
  return fc
    .tuple(fc.constantFrom(...seeds), fc.array(fc.tuple(fc.nat(), fc.nat(12), fc.string({ maxLength: 6 }), fc.nat(3)), { maxLength: maxEdits }))
    .map(([seed, edits]) => {
      let t = seed;
      for (const [pos, len, ins, kind] of edits) {
        const p = pos % (t.length + 1);
        if (kind === 0) t = t.slice(0, p) + ins + t.slice(p);
        else if (kind === 1) t = t.slice(0, p) + t.slice(p + len);
        else if (kind === 2) t = t.slice(0, p) + t.slice(p, p + len) + t.slice(p);
        else t = t.slice(0, p) + ins.replace(/./g, (c) => String.fromCharCode((c.charCodeAt(0) * 7) % 0x3000)) + t.slice(p + len);
      }
      return t;
    });
}
