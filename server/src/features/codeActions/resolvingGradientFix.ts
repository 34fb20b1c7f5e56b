/**
 * `beam-unresolved` and `beam-one-peak`: set the magnet's gradient to the smallest one the advice
 * found to resolve every pair (`data.resolvingGradientTPerM`, computed on this setup). Only the
 * number changes: the unit as the user wrote it (T/m, G/cm), its sign, and the rest of the line stay.
 */
import type { CodeAction } from 'vscode-languageserver-types';
import { convertSI } from '../../format/units';
import { type FixContext, quickFix } from './types';

/** Rounded away from zero to 3 significant digits: the written value must not fall below the one that resolves. */
export function roundedUp(x: number): string {
  const step = 10 ** (Math.floor(Math.log10(x)) - 2);
  const near = Number(x.toPrecision(3));
  // A value already of 3 digits (1.11 after a unit conversion's round-off) stays as it is.
  if (near >= x * (1 - 1e-12)) return String(near);
  return String(Number((near + step).toPrecision(3)));
}

export function resolvingGradientFix(ctx: FixContext): CodeAction[] {
  const { resolvingGradientTPerM: g, magnet: name } = ctx.problem.data ?? {};
  if (typeof g !== 'number' || !(g > 0) || typeof name !== 'string') return [];
  const magnet = ctx.analysis.model?.magnets.find((m) => m.name === name);
  // Only a magnet written in this document (not one from a `use`d file), with one plain quantity on one line.
  if (!magnet || !ctx.analysis.doc.blocks.includes(magnet.node)) return [];
  const setting = magnet.node.settings.find((s) => s.key.text === 'gradient');
  const part = setting?.groups.length === 1 && setting.groups[0]!.length === 1 ? setting.groups[0]![0]! : undefined;
  // A written uncertainty belongs to the old number: it is left for the user to restate.
  if (!part || part.kind !== 'quantity' || part.number.uncertainty !== undefined || part.range.start.line !== part.range.end.line) return [];
  const inUnit = convertSI(g, 'gradient', part.unit.text);
  if (inUnit === undefined || !(inUnit > 0) || !Number.isFinite(inUnit)) return [];
  const numberLength = part.text.slice(0, part.text.length - part.unit.text.length).trimEnd().length;
  const text = `${part.number.value < 0 ? '-' : ''}${roundedUp(inUnit)}`;
  const start = part.range.start;
  const edit = { range: { start, end: { line: start.line, character: start.character + numberLength } }, newText: text };
  return [quickFix(ctx, `Set the gradient of magnet '${name}' to ${text} ${part.unit.text} (resolves the peaks)`, [edit])];
}
