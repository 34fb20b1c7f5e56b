/** The field-map diagram of a file's sources, for the panel and `sublevel render --view fieldmap`. */
import type { SetupModel } from '../model/types';
import { fieldMapCsv, renderFieldMap, type RenderTheme } from '../render';
import type { DiagramAnswer, DiagramRequest } from './diagram';
import { fieldMapView } from './fieldMapView';
import { cleanField } from '../eval/cleanField';
import type { FieldSample } from '../physics/fields/types';

/** A point with no field value: the view leaves a gap there. */
const ON_A_CONDUCTOR: FieldSample = { B: [NaN, NaN, NaN], gradient: [[NaN, NaN, NaN], [NaN, NaN, NaN], [NaN, NaN, NaN]] };

export function fieldMapFor(model: SetupModel, req: DiagramRequest, theme: RenderTheme): DiagramAnswer {
  const chosen = req.sourceNames ? model.sources.filter((s) => req.sourceNames!.includes(s.name)) : model.sources;
  if (chosen.length === 0) return { ok: false, message: 'No field source to draw: add a `coil`, `solenoid`, `wire` or `slab` block (docs/fields.md).' };
  const usable = chosen.filter((s) => s.parts.length > 0);
  const broken = chosen.filter((s) => s.parts.length === 0);
  if (usable.length === 0) return { ok: false, message: `${broken.map((s) => `${s.kind} '${s.name}'`).join(', ')} ${broken.length === 1 ? 'has' : 'have'} problems to fix before the field can be drawn; see the Problems view.` };
  // The file's first field written with a unit sets the family of the |B| axis.
  const written = model.fields.find((f) => f.tesla?.unit !== undefined)?.tesla?.unit ?? model.magnets.find((m) => m.fieldT?.unit !== undefined)?.fieldT?.unit;
  const clean = cleanField(usable.flatMap((s) => s.parts));
  const v = fieldMapView(
    usable.map((s) => ({ name: s.name, kind: s.kind, parts: s.parts })),
    (p) => {
      const c = clean(p);
      return 'sample' in c ? c.sample : ON_A_CONDUCTOR;
    },
    { ...(req.fieldUnit ? { fieldUnit: req.fieldUnit } : {}), ...(written ? { writtenUnit: written } : {}), ...(req.fieldScale ? { scale: req.fieldScale } : {}) },
  );
  if (!v) return { ok: false, message: 'The field sources have nothing to draw; see the Problems view.' };
  const about: [string, string][] = [['file', req.source ?? ''], ['sources', usable.map((s) => s.name).join(' + ')]];
  return { ok: true, title: v.title, svg: renderFieldMap(v, theme), csv: fieldMapCsv(v, about) };
}
