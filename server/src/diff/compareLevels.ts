/** Levels and whole terms: g-factors, hyperfine structure, and every sublevel's energy and moment at each working field. */
import type { ExactSublevelResult, LevelResult, TermResult } from '../eval/resultTypes';
import { ChangeList, pairByKey } from './changeList';
import type { DiffThresholds } from './diffTypes';
import { frequency, gFactor, moment } from './writers';

type AtField = { source: { kind: 'field' | 'magnet'; name: string }; exact: ExactSublevelResult[] };

const fieldName = (p: AtField): string => `${p.source.kind} ${p.source.name}`;

/** Sublevels matched by their low-field label at each working field matched by name. */
function compareAtFields(list: ChangeList, a: readonly AtField[], b: readonly AtField[], t: DiffThresholds): void {
  const points = pairByKey(a, b, fieldName);
  list.presence('working field', points.oldKeys, points.newKeys);
  for (const [pa, pb] of points.pairs) {
    const at = fieldName(pa);
    const states = pairByKey(pa.exact, pb.exact, (s) => s.low_label);
    list.presence('sublevel', states.oldKeys, states.newKeys, { at });
    for (const [sa, sb] of states.pairs) {
      list.number('energy', sa.energy_Hz, sb.energy_Hz, t.frequency_Hz, frequency, 'Hz', { subject: sa.low_label, at });
      list.number('moment', sa.moment_bohr, sb.moment_bohr, t.moment_bohr, moment, 'μ_B', { subject: sa.low_label, at });
    }
  }
}

export function compareLevel(a: LevelResult, b: LevelResult, t: DiffThresholds): ChangeList {
  const list = new ChangeList();
  list.value('term', a.designation.text, b.designation.text);
  list.number('g_J', a.g_J.used, b.g_J.used, t.g, gFactor, '');
  list.number('A', a.hyperfine?.A_Hz.value, b.hyperfine?.A_Hz.value, t.frequency_Hz, frequency, 'Hz');
  list.number('B', a.hyperfine?.B_Hz?.value, b.hyperfine?.B_Hz?.value, t.frequency_Hz, frequency, 'Hz');
  list.number('C', a.hyperfine?.C_Hz?.value, b.hyperfine?.C_Hz?.value, t.frequency_Hz, frequency, 'Hz');
  const fLevels = pairByKey(a.hyperfine?.levels ?? [], b.hyperfine?.levels ?? [], (l) => `F=${l.F_text}`);
  list.presence('F level', fLevels.oldKeys, fLevels.newKeys);
  for (const [la, lb] of fLevels.pairs) list.number('g_F', la.g_F, lb.g_F, t.g, gFactor, '', { subject: `F=${la.F_text}` });
  const intervals = pairByKey(a.hyperfine?.intervals ?? [], b.hyperfine?.intervals ?? [], (i) => `F=${i.F_lower}–${i.F_upper}`);
  for (const [ia, ib] of intervals.pairs) list.number('hyperfine interval', ia.interval_Hz, ib.interval_Hz, t.frequency_Hz, frequency, 'Hz', { subject: `F=${ia.F_lower}–${ia.F_upper}` });
  compareAtFields(list, a.at_fields, b.at_fields, t);
  return list;
}

export function compareTerm(a: TermResult, b: TermResult, t: DiffThresholds): ChangeList {
  const list = new ChangeList();
  list.value('term', a.designation.text, b.designation.text);
  list.number('zeta', a.zeta_Hz?.value, b.zeta_Hz?.value, t.frequency_Hz, frequency, 'Hz');
  const fine = pairByKey(a.fine_levels, b.fine_levels, (l) => `J=${l.J_text}`);
  list.presence('J level', fine.oldKeys, fine.newKeys);
  for (const [la, lb] of fine.pairs) {
    list.number('fine-structure shift', la.shift_Hz, lb.shift_Hz, t.frequency_Hz, frequency, 'Hz', { subject: `J=${la.J_text}` });
    list.number('g_J', la.g_J, lb.g_J, t.g, gFactor, '', { subject: `J=${la.J_text}` });
  }
  compareAtFields(list, a.at_fields, b.at_fields, t);
  return list;
}
