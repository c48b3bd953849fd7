// Bundled Monaco, no CDN: the loader is handed the local module instead of fetching one.
// Only the core editor API, the editor features and the JSON language are pulled in;
// importing the package root would also bundle every other language and the TypeScript,
// CSS and HTML workers. Picking individual editor features instead of register.all was
// measured to save almost nothing, since the core editor API dominates the chunk.
// Import this module only from the playground so it stays in that route's lazy chunk.
import { loader } from '@monaco-editor/react';
import * as monaco from 'monaco-editor/editor/editor.api';
import 'monaco-editor/features/register.all';
import 'monaco-editor/language/json/monaco.contribution';
import EditorWorker from 'monaco-editor/editor/editor.worker?worker';
import JsonWorker from 'monaco-editor/language/json/json.worker?worker';

self.MonacoEnvironment = {
  getWorker(_workerId: string, label: string) {
    return label === 'json' ? new JsonWorker() : new EditorWorker();
  },
};

loader.config({ monaco });

export { monaco };
