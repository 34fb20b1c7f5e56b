/**
 * The user's settings for one document (section `sublevel` of the editor's configuration),
 * read defensively: anything missing or of the wrong type falls back to the default.
 * The contributed schema is `contributes.configuration` in package.json.
 */
import { DEFAULT_HOVER_OPTIONS, type HoverOptions } from '../features/hover/context';

export interface EditorSettings {
  inlayHints: { enabled: boolean };
  hover: HoverOptions;
  /** Notes that a level has left the weak-field regime (the CLI always reports them). */
  regimeNotes: { enabled: boolean };
  /**
   * Whether the evaluation worker evaluates a built-in set-up while idle before the first file
   * (WorkerEvaluator.warmUp). Off by default: it costs the server 35–80 MB of resident memory with
   * a 20,000-line file (docs/editor.md). Read once, from the settings without a document.
   */
  evaluation: { warmUp: boolean };
}

export const DEFAULT_SETTINGS: EditorSettings = { inlayHints: { enabled: true }, hover: DEFAULT_HOVER_OPTIONS, regimeNotes: { enabled: true }, evaluation: { warmUp: false } };

/** The codes `regimeNotes.enabled: false` hides in the editor. */
export const REGIME_NOTE_CODES: ReadonlySet<string> = new Set(['zeeman-not-linear', 'zeeman-strong-field', 'diamagnetic-not-included']);

function object(x: unknown): Record<string, unknown> {
  return typeof x === 'object' && x !== null ? (x as Record<string, unknown>) : {};
}

function count(x: unknown, fallback: number, max: number): number {
  return typeof x === 'number' && Number.isInteger(x) && x >= 0 ? Math.min(x, max) : fallback;
}

/** Settings from the `sublevel` section as the client sends it. */
export function readSettings(section: unknown): EditorSettings {
  const s = object(section);
  const inlay = object(s.inlayHints);
  const hover = object(s.hover);
  const regime = object(s.regimeNotes);
  const evaluation = object(s.evaluation);
  return {
    inlayHints: { enabled: typeof inlay.enabled === 'boolean' ? inlay.enabled : DEFAULT_SETTINGS.inlayHints.enabled },
    hover: {
      sublevelRows: count(hover.sublevelRows, DEFAULT_HOVER_OPTIONS.sublevelRows, 500),
      levelTables: count(hover.levelTables, DEFAULT_HOVER_OPTIONS.levelTables, 50),
    },
    regimeNotes: { enabled: typeof regime.enabled === 'boolean' ? regime.enabled : DEFAULT_SETTINGS.regimeNotes.enabled },
    evaluation: { warmUp: typeof evaluation.warmUp === 'boolean' ? evaluation.warmUp : DEFAULT_SETTINGS.evaluation.warmUp },
  };
}
