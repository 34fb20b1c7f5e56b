import * as assert from 'node:assert/strict';
import { describe, it } from '../harness';
import { exampleUri, extension, openSetup, whenDiagnostics } from './workspace';

export function registerActivationTests(): void {
  describe('activation', () => {
    it('is loaded but not active before a setup file is opened', () => {
      assert.equal(extension().isActive, false);
    });

    it('activates when a .sublevel file is opened, and its server reports problems', async () => {
      const editor = await openSetup('mistakes.sublevel');
      assert.equal(editor.document.languageId, 'sublevel');
      await whenDiagnostics(exampleUri('mistakes.sublevel'), (ds) => (ds.length > 0 ? true : undefined));
      assert.equal(extension().isActive, true);
    });
  });
}
