/** One analysis per document version: every request on the same version reuses it. */
import type { Analysis } from '../eval/analyze';
import { analyzeStaged, type ErrorLog } from './stagedAnalysis';

interface Entry {
  version: number;
  analysis: Analysis;
}

export class AnalysisCache {
  private readonly entries = new Map<string, Entry>();

  constructor(private readonly log: ErrorLog = () => undefined) {}

  get(uri: string, version: number, text: string): Analysis {
    const hit = this.entries.get(uri);
    if (hit && hit.version === version) return hit.analysis;
    const analysis = analyzeStaged(text, this.log);
    this.entries.set(uri, { version, analysis });
    return analysis;
  }

  /** The cached analysis if it is for this version (no work otherwise). */
  peek(uri: string, version: number): Analysis | undefined {
    const hit = this.entries.get(uri);
    return hit && hit.version === version ? hit.analysis : undefined;
  }

  drop(uri: string): void {
    this.entries.delete(uri);
  }
}
