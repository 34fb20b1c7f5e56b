/**
 * Inline values after the statements that produce numbers: g_J after a level's term, the
 * hyperfine splitting after a level with A, the Zeeman scale μ_B·B/h after a field, the force
 * on one Bohr magneton after a gradient, the peaks and their resolution after a beam, and the
 * frequency and wavelength after a line.
 * Only blocks that meet the requested range are looked at.
 */
import { type InlayHint, InlayHintKind, type Position, type Range } from 'vscode-languageserver-types';
import type { Analysis } from '../eval/analyze';
import { halfText } from '../eval/halves';
import { fieldText, frequencyText, gradientText, prefixedText, trimNumber, uncertaintyVisible, withUncertainty } from '../eval/quantityText';
import type { BlockNode, LevelNode } from '../format/ast';
import { comparePositions } from '../format/positions';
import type { SetupModel } from '../model/types';
import { beamVerdict } from './hover/beamSection';
import { fitSummary, residualLabel } from './hover/fitSection';
import { zeemanScaleHz } from './hover/fieldSection';
import { lineFrequency } from './hover/lineSection';
import { bohrForceN } from './hover/magnetSection';
import { lastStartingAtOrBefore } from './shared/locate';
import { beamOfBlock, fieldOfBlock, levelOfNode, lineOfBlock, magnetOfBlock } from './shared/modelLookup';
import { levelResult, termResult } from './shared/results';
import { sourceSummary } from '../eval/fieldSourceText';
import { vacuumWavelengthNmText, vacuumWavelengthOf } from '../eval/wavelengthText';
import { slowerHint } from '../eval/slowerText';
import { trapHint } from '../eval/trapText';

function hint(position: Position, label: string, tooltip?: string): InlayHint {
  return { position, label, kind: InlayHintKind.Parameter, paddingLeft: true, ...(tooltip ? { tooltip } : {}) };
}

function inRange(p: Position, range: Range): boolean {
  return comparePositions(range.start, p) <= 0 && comparePositions(p, range.end) <= 0;
}

function levelHints(analysis: Analysis, block: BlockNode, node: LevelNode, out: InlayHint[]): void {
  const level = levelOfNode(analysis.model, block, node);
  if (!level || !level.valid || !node.designation) return;
  if (level.kind === 'term') {
    const t = termResult(analysis.result, level.species.name, level.name);
    if (!t || t.fine_levels.length < 2) return;
    const gaps = t.fine_levels.slice(1).map((u, i) => frequencyText(u.shift_Hz - t.fine_levels[i]!.shift_Hz, 4));
    const tip = t.fine_levels.map((l) => `J = ${l.J_text}: ${frequencyText(l.shift_Hz)}, g_J ${trimNumber(l.g_J, 6)}`).join('\n');
    out.push(hint(node.designation.range.end, `J ${t.fine_levels.map((l) => l.J_text).join(', ')}: ΔE_fs ${gaps.join(', ')}`, tip));
    return;
  }
  const r = levelResult(analysis.result, level.species.name, level.name);
  if (!r) return;
  const g = r.g_J;
  out.push(hint(node.designation.range.end, `g_J ${withUncertainty(g.used, g.used_unc, (v) => trimNumber(v, 6))}`, g.measured ? `measured g_J (${g.used_source}); Landé ${trimNumber(g.lande, 7)}` : `Landé g_J, exactly ${g.lande_fraction} with g_s = 2`));
  const hf = r.hyperfine;
  if (!hf || hf.intervals.length === 0) return;
  const a = node.settings.find((s) => s.key.text === 'A');
  const at = a ? a.range.end : node.designation.range.end;
  const label = hf.intervals.length === 1 ? `ΔE_hfs ${withUncertainty(hf.intervals[0]!.interval_Hz, hf.intervals[0]!.interval_Hz_unc, (v) => frequencyText(v, 6))}` : `ΔE_hfs ${hf.intervals.map((i) => withUncertainty(i.interval_Hz, i.interval_Hz_unc, (v) => frequencyText(v, 4))).join(', ')}`;
  // F written as the hovers and reports write it: 1/2, 3/2, not 0.5, 1.5.
  const tip = hf.intervals.map((i) => `F = ${halfText(Math.round(2 * i.F_lower))} ↔ ${halfText(Math.round(2 * i.F_upper))}: ${withUncertainty(i.interval_Hz, i.interval_Hz_unc, (v) => frequencyText(v))}`).join('\n');
  if (a) out.push(hint(at, label, tip));
  else out[out.length - 1] = { ...out[out.length - 1]!, label: `${out[out.length - 1]!.label as string}, ${label}`, tooltip: tip };
}

function blockHints(analysis: Analysis, model: SetupModel, block: BlockNode, out: InlayHint[]): void {
  switch (block.kind) {
    case 'species':
      for (const l of block.levels) levelHints(analysis, block, l, out);
      break;
    case 'field': {
      const f = fieldOfBlock(model, block);
      const s = block.headerSetting;
      if (f?.tesla && s) out.push(hint(s.range.end, `μ_B·B/h ${frequencyText(zeemanScaleHz(f.tesla.value), 5)}`, 'Zeeman scale: shift of a sublevel with g·m = 1'));
      break;
    }
    case 'magnet': {
      const m = magnetOfBlock(model, block);
      if (!m) break;
      const fieldSetting = block.settings.find((s) => s.key.text === 'field');
      if (m.fieldT && fieldSetting) out.push(hint(fieldSetting.range.end, `μ_B·B/h ${frequencyText(zeemanScaleHz(m.fieldT.value), 5)}`, 'Zeeman scale: shift of a sublevel with g·m = 1'));
      const gradSetting = block.settings.find((s) => s.key.text === 'gradient');
      if (m.gradientTPerM && gradSetting) out.push(hint(gradSetting.range.end, `μ_B·b ${prefixedText(bohrForceN(m.gradientTPerM.value), 'N', { digits: 4 })}`, 'force on a moment of one Bohr magneton'));
      // Built from sources: what they make where the beam line passes.
      const sourcesSetting = block.settings.find((s) => s.key.text === 'sources');
      if (m.sources && sourcesSetting && m.fieldT && m.gradientTPerM) {
        out.push(hint(sourcesSetting.range.end, `|B| ${fieldText(m.fieldT.value, 4)}, ∂|B|/∂z ${gradientText(m.gradientTPerM.value, 4)}`, 'field and gradient of the sources at the centre of the beam line (`at`); a beam through them reports ∂|B|/∂z averaged along the magnet\'s length'));
      }
      break;
    }
    case 'beam': {
      const beam = beamOfBlock(model, block);
      const r = beam && analysis.result?.beams.find((b) => b.name === beam.name);
      const verdict = r && beamVerdict(r);
      if (verdict) out.push(hint(block.headerRange.end, verdict, 'peaks at the detector, from the beam evaluation'));
      break;
    }
    case 'line': {
      const line = lineOfBlock(model, block);
      if (!line?.lower || !line.upper || !block.link?.to) break;
      const r = analysis.result?.lines.find((l) => l.name === line.name);
      const f = lineFrequency(
        r,
        levelResult(analysis.result, line.lower.species.name, line.lower.name),
        levelResult(analysis.result, line.upper.species.name, line.upper.name),
      );
      const parts = [
        ...(f ? lineCentreHint(f.hz, f.unc) : []),
        ...(r?.g_eff !== undefined ? [`g_eff ${trimNumber(r.g_eff, 4)}`] : []),
      ];
      if (parts.length > 0) out.push(hint(block.link.to.range.end, parts.join(', '), 'line centre from the level energies; effective Landé factor of the line'));
      break;
    }
    case 'fit': {
      const f = block.name && analysis.result?.fits?.find((x) => x.name === block.name!.text);
      const summary = f && fitSummary(f);
      if (summary) out.push(hint(block.headerRange.end, summary, 'fitted by weighted least squares on the exact engine (sublevel fit)'));
      break;
    }
    case 'data': {
      // Each point's residual in every fit of this data, after the point.
      const name = block.name?.text;
      for (const f of analysis.result?.fits ?? []) {
        for (const p of f.points) {
          const s = block.settings.find((x) => x.key.text === 'point' && x.range.start.line === p.line);
          const label = p.data === name && s && p.csv_line === undefined ? residualLabel(f, p) : undefined;
          if (label && s) out.push(hint(s.range.end, label, `measured − model in fit '${f.name}'`));
        }
        const summary = f.points.some((p) => p.data === name) ? fitSummary(f) : undefined;
        if (summary && block.name) out.push(hint(block.headerRange.end, `${f.name}: ${summary}`, `fit '${f.name}' of this data`));
      }
      break;
    }
    case 'trap': {
      const t = block.name && analysis.result?.traps?.find((x) => x.name === block.name!.text);
      const label = t && trapHint(t);
      if (label) out.push(hint(block.headerRange.end, label, 'sublevels the trap holds and their depths (hover for the table)'));
      break;
    }
    case 'slower': {
      const s = block.name && analysis.result?.slowers?.find((x) => x.name === block.name!.text);
      const label = s && slowerHint(s);
      if (label) out.push(hint(block.headerRange.end, label, 'length, ideal field from entrance to exit and laser detuning from the line (hover for more)'));
      break;
    }
    case 'coil':
    case 'solenoid':
    case 'wire':
    case 'slab': {
      const r = block.name && analysis.result?.fieldSources?.find((x) => x.name === block.name!.text && x.kind === block.kind);
      const summary = r && sourceSummary(r);
      if (summary) out.push(hint(block.headerRange.end, summary, 'field source: the field or gradient at its centre, the winding\'s power and current density (hover for more)'));
      break;
    }
    default:
      break;
  }
}

export function inlayHints(analysis: Analysis, range: Range): InlayHint[] {
  const model = analysis.model;
  if (!model) return [];
  const blocks = analysis.doc.blocks;
  const first = Math.max(0, lastStartingAtOrBefore(blocks, range.start.line, (b) => b.headerRange.start.line));
  const out: InlayHint[] = [];
  for (let i = first; i < blocks.length; i++) {
    const block = blocks[i]!;
    if (block.headerRange.start.line > range.end.line) break;
    if (block.range.end.line < range.start.line) continue;
    blockHints(analysis, model, block, out);
  }
  return out.filter((h) => inRange(h.position, range));
}

/**
 * A line's frequency and vacuum wavelength at 7 digits, both with the frequency's uncertainty
 * carried when it would change a printed digit of either (so the two never disagree), else neither.
 */
function lineCentreHint(hz: number, unc: number | undefined): string[] {
  const w = vacuumWavelengthOf(Math.abs(hz), unc);
  const shown = uncertaintyVisible(hz, unc, 7) || (w?.unc !== undefined && uncertaintyVisible(w.m * 1e9, w.unc * 1e9, 7));
  const frequency = (v: number): string => frequencyText(v, 7);
  return [shown ? withUncertainty(hz, unc, frequency) : frequency(hz), `λ_vac ${vacuumWavelengthNmText(Math.abs(hz), shown ? unc : undefined, 7)}`];
}
