/**
 * Hover: finds what is under the cursor and joins the sections that describe it (one section
 * builder per kind of thing in hover/). A species or level from a used file says where it is defined. To show a new kind of result, add a section builder
 * and call it from `sectionsFor`.
 */
import { type Hover, MarkupKind, type Position, type Range } from 'vscode-languageserver-types';
import type { Analysis } from '../eval/analyze';
import type { BlockNode } from '../format/ast';
import type { LevelModel } from '../model/types';
import { beamSection } from './hover/beamSection';
import { DEFAULT_HOVER_OPTIONS, type HoverContext, type HoverOptions } from './hover/context';
import { fieldSection } from './hover/fieldSection';
import { fineStructureSection } from './hover/fineStructureSection';
import { hyperfineSection } from './hover/hyperfineSection';
import { fitSection } from './hover/fitSection';
import { blockWordSection, keySection } from './hover/keySection';
import { lineSection } from './hover/lineSection';
import { magnetSection } from './hover/magnetSection';
import { quantitySection } from './hover/quantitySection';
import { resonanceSection } from './hover/resonanceSection';
import { slowerSection } from './hover/slowerSection';
import { speciesSection } from './hover/speciesSection';
import { sourceSection } from './hover/sourceSection';
import { termSection } from './hover/termSection';
import { trapSection } from './hover/trapSection';
import { useSection } from './hover/useSection';
import { locate, type Target, useAt } from './shared/locate';
import { md } from './shared/markdown';
import {
  beamOfBlock,
  declaredAt,
  fieldOfBlock,
  levelOfNode,
  lineOfBlock,
  magnetOfBlock,
  resonanceOfBlock,
  speciesOfBlock,
  type Declared,
} from './shared/modelLookup';
import { nameAt } from './shared/names';
import { levelResult, termResult } from './shared/results';

export type { HoverOptions } from './hover/context';
export { DEFAULT_HOVER_OPTIONS } from './hover/context';

function levelSections(level: LevelModel, ctx: HoverContext, withHyperfine = true): string[] {
  const origin = level.species.origin;
  const title = `*level ${md(level.name)} of ${md(level.species.name)}*${origin ? ` — defined in ${md(origin.path)}` : ''}`;
  if (level.kind === 'term') {
    const t = termResult(ctx.analysis.result, level.species.name, level.name);
    return [`${title}\n\n${t ? fineStructureSection(t) : termSection(level, undefined)}`];
  }
  const r = levelResult(ctx.analysis.result, level.species.name, level.name);
  const out = [`${title}\n\n${termSection(level, r)}`];
  if (r && withHyperfine) {
    const hf = hyperfineSection(r);
    if (hf) out.push(hf);
  }
  return out;
}

function magnetSectionFor(name: string, ctx: HoverContext): string[] {
  const m = ctx.analysis.result?.magnets.find((x) => x.name === name);
  return m ? [magnetSection(m, { result: ctx.analysis.result, options: ctx.options })] : [];
}

/** The hover of a declared thing (used for the declaration itself and for references to it). */
function declaredSections(d: Declared, ctx: HoverContext): string[] {
  switch (d.kind) {
    case 'species':
      return [speciesSection(d.item, ctx.analysis.result)];
    case 'level':
      return levelSections(d.item, ctx);
    case 'field':
      return [fieldSection(d.item.name, d.item.tesla?.value, { result: ctx.analysis.result, options: ctx.options }, d.item.tesla?.unit, d.item.species?.map((x) => x.name))];
    case 'magnet':
      return magnetSectionFor(d.item.name, ctx);
    case 'beam':
      return [beamSection(d.item, ctx.analysis.result?.beams.find((b) => b.name === d.item.name), ctx.options.sublevelRows, ctx.analysis.result)];
    case 'line':
      return [lineSection(d.item, ctx.analysis.result, ctx.options.sublevelRows)];
    case 'resonance': {
      const r = ctx.analysis.result?.resonances.find((x) => x.name === d.item.name);
      return r ? [resonanceSection(r, ctx.options.sublevelRows, ctx.analysis.result)] : [];
    }
    default:
      return [];
  }
}

function blockSections(block: BlockNode, ctx: HoverContext): string[] {
  const model = ctx.analysis.model;
  switch (block.kind) {
    case 'species': {
      const s = speciesOfBlock(model, block);
      return s ? [speciesSection(s, ctx.analysis.result)] : [];
    }
    case 'field': {
      const f = fieldOfBlock(model, block);
      return f ? declaredSections({ kind: 'field', item: f }, ctx) : [];
    }
    case 'magnet': {
      const m = magnetOfBlock(model, block);
      return m ? magnetSectionFor(m.name, ctx) : [];
    }
    case 'beam': {
      const b = beamOfBlock(model, block);
      return b ? declaredSections({ kind: 'beam', item: b }, ctx) : [];
    }
    case 'line': {
      const l = lineOfBlock(model, block);
      return l ? declaredSections({ kind: 'line', item: l }, ctx) : [];
    }
    case 'resonance': {
      const r = resonanceOfBlock(model, block);
      return r ? declaredSections({ kind: 'resonance', item: r }, ctx) : [];
    }
    case 'fit':
    case 'data':
      return fitSectionsOf(block, ctx);
    case 'slower': {
      const s = ctx.analysis.result?.slowers?.find((x) => x.name === block.name?.text);
      return s ? [slowerSection(s)] : [];
    }
    case 'trap': {
      const t = ctx.analysis.result?.traps?.find((x) => x.name === block.name?.text);
      return t ? [trapSection(t)] : [];
    }
    default:
      return fieldSourceSections(block, ctx);
  }
}

/** A `coil`, `solenoid`, `wire` or `slab` block: its entry in the evaluation, by name and kind. */
function fieldSourceSections(block: BlockNode, ctx: HoverContext): string[] {
  const r = ctx.analysis.result?.fieldSources?.find((s) => s.name === block.name?.text && s.kind === block.kind);
  return r ? [sourceSection(r)] : [];
}

/** The fit a `fit` block asks for, or the fits that use a `data` block. */
function fitSectionsOf(block: BlockNode, ctx: HoverContext): string[] {
  const name = block.name?.text;
  const fits = ctx.analysis.result?.fits ?? [];
  const mine = block.kind === 'fit' ? fits.filter((f) => f.name === name) : fits.filter((f) => f.points.some((p) => p.data === name));
  return mine.map(fitSection);
}

function referenceSections(ctx: HoverContext, pos: Position): string[] | undefined {
  const model = ctx.analysis.model;
  if (!model) return undefined;
  const use = nameAt(model, pos);
  if (!use || use.isDeclaration || !use.target) return undefined;
  const d = declaredAt(model, use.target.kind, use.target.range, use.target.uri);
  return d ? declaredSections(d, ctx) : undefined;
}

function sectionsFor(t: Target, ctx: HoverContext, pos: Position): string[] {
  const model = ctx.analysis.model;
  switch (t.kind) {
    case 'block-keyword':
      return [blockWordSection(t.block.kind), ...blockSections(t.block, ctx)];
    case 'block-name':
      return blockSections(t.block, ctx);
    case 'level-keyword':
    case 'level-name': {
      const level = levelOfNode(model, t.block, t.level);
      return level ? levelSections(level, ctx) : [];
    }
    case 'designation': {
      const level = levelOfNode(model, t.block, t.level);
      return level ? levelSections(level, ctx) : [];
    }
    case 'link':
      return referenceSections(ctx, pos) ?? [];
    case 'key': {
      const doc = keySection(t.block.kind, t.setting.key.text, t.level !== undefined);
      const q = t.setting.groups.flat().map(quantitySection).find((x) => x !== undefined);
      return [doc, q].filter((x): x is string => x !== undefined);
    }
    case 'value': {
      const refs = referenceSections(ctx, pos);
      if (refs) return refs;
      const out: string[] = [];
      const q = t.part ? quantitySection(t.part) : undefined;
      if (q) out.push(q);
      if (t.block.kind === 'field') out.push(...blockSections(t.block, ctx));
      else if (t.block.kind === 'magnet' && t.setting.key.text === 'field') out.push(...blockSections(t.block, ctx).slice(0, 1));
      else if (t.level && ['A', 'B', 'C'].includes(t.setting.key.text)) {
        const level = levelOfNode(model, t.block, t.level);
        const r = level && levelResult(ctx.analysis.result, level.species.name, level.name);
        const hf = r && hyperfineSection(r);
        if (hf) out.push(hf);
      } else if (t.level && t.setting.key.text === 'g_J') {
        const level = levelOfNode(model, t.block, t.level);
        if (level) out.push(...levelSections(level, ctx, false));
      }
      if (out.length === 0) {
        const doc = keySection(t.block.kind, t.setting.key.text, t.level !== undefined);
        if (doc) out.push(doc);
      }
      return out;
    }
    default:
      return [];
  }
}

function targetRange(t: Target): Range | undefined {
  switch (t.kind) {
    case 'block-keyword':
      return t.block.keyword.range;
    case 'block-name':
      return t.block.name?.range;
    case 'level-keyword':
      return t.level.keyword.range;
    case 'level-name':
      return t.level.name?.range;
    case 'designation':
      return t.level.designation?.range;
    case 'link':
      return t.ref.range;
    case 'key':
      return t.setting.key.range;
    case 'value':
      return t.part?.range ?? t.setting.valueText.range;
    default:
      return undefined;
  }
}

export function hover(analysis: Analysis, pos: Position, options: HoverOptions = DEFAULT_HOVER_OPTIONS): Hover | null {
  const statement = useAt(analysis.doc, pos);
  if (statement) {
    const used = analysis.model?.uses.find((u) => u.node === statement);
    return used ? { contents: { kind: MarkupKind.Markdown, value: useSection(used) }, range: statement.range } : null;
  }
  const target = locate(analysis.doc, pos);
  if (!target || target.kind === 'comment') return null;
  const sections = sectionsFor(target, { analysis, options }, pos).filter((s) => s.trim() !== '');
  if (sections.length === 0) return null;
  const range = targetRange(target);
  return {
    contents: { kind: MarkupKind.Markdown, value: sections.join('\n\n---\n\n') },
    ...(range ? { range } : {}),
  };
}
