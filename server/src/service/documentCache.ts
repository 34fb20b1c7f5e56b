/** One analysis per document version: every request on the same version reuses it. */
import { analyze, type Analysis } from '../eval/analyze';

interface Entry {
  version: number;
  analysis: Analysis;
}

export class AnalysisCache {
  private readonly entries = new Map<string, Entry>();

  get(uri: string, version: number, text: string): Analysis {
    const hit = this.entries.get(uri);
    if (hit && hit.version === version) return hit.analysis;
    const analysis = analyze(text);
    this.entries.set(uri, { version, analysis });
    return analysis;
  }

  drop(uri: string): void {
    this.entries.delete(uri);
  }
}
