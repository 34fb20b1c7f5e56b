/**
 * Everything the language server needs from the analysis side, in one module. esbuild makes it
 * a bundle of its own (`dist/service.js`) that `dist/server.js` loads only after answering
 * `initialize`, so the protocol layer starts without compiling the parser, model and physics.
 */
export { LanguageService } from './languageService';
export { readSettings } from './settings';
export { WorkerEvaluator } from './workerEvaluator';
export { editorFiles } from './workspaceFiles';
export { serveEvaluations } from './evaluatorThread';
