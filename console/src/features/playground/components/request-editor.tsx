import { monaco } from '@/lib/monaco-setup';
import Editor, { type OnMount } from '@monaco-editor/react';
import { jsonDefaults } from 'monaco-editor/languages/features/json/register';
import { Flex, Text } from '@radix-ui/themes';
import { useEffect, useRef } from 'react';
import { useAppearance } from '@/components/appearance';
import { PageLoading } from '@/components/page-loading';

export type EditorSchema = {
  /** The editor model this schema applies to (one per endpoint, so each keeps its own text and undo). */
  modelPath: string;
  /** JSON Schema of the request body, or null while the API description loads. */
  schema: object | null;
};

type RequestEditorProps = {
  value: string;
  onChange: (next: string) => void;
  hintId: string;
  modelPath: string;
  schemas: EditorSchema[];
  /** Ctrl/Cmd+Enter inside the editor. */
  onSubmit: () => void;
};

function modelUri(path: string): string {
  return monaco.Uri.parse(path).toString();
}

export function RequestEditor({ value, onChange, hintId, modelPath, schemas, onSubmit }: RequestEditorProps) {
  const { appearance } = useAppearance();
  const submit = useRef(onSubmit);
  submit.current = onSubmit;

  // Validation and completion come from the API's own description. Schemas are handed over inline and
  // schema requests stay off, so the editor never fetches anything itself.
  useEffect(() => {
    jsonDefaults.setDiagnosticsOptions({
      validate: true,
      allowComments: false,
      enableSchemaRequest: false,
      schemaValidation: 'error',
      schemas: schemas
        .filter((entry) => entry.schema !== null)
        .map((entry) => ({
          uri: `inmemory://leastline/schemas/${encodeURIComponent(entry.modelPath)}`,
          fileMatch: [modelUri(entry.modelPath)],
          schema: entry.schema,
        })),
    });
  }, [schemas]);

  const handleMount: OnMount = (editor, editorApi) => {
    editor.addCommand(editorApi.KeyMod.CtrlCmd | editorApi.KeyCode.Enter, () => submit.current());
  };

  return (
    <Flex direction="column" gap="2">
      <div className="ll-editor-frame">
        <Editor
          height="440px"
          language="json"
          path={modelPath}
          value={value}
          onChange={(next) => onChange(next ?? '')}
          onMount={handleMount}
          theme={appearance === 'dark' ? 'vs-dark' : 'vs'}
          loading={<PageLoading />}
          options={{
            ariaLabel: 'Request body, JSON',
            fontFamily: "'Fira Code', ui-monospace, monospace",
            fontSize: 13,
            lineHeight: 20,
            minimap: { enabled: false },
            scrollBeyondLastLine: false,
            automaticLayout: true,
            tabSize: 2,
            renderLineHighlight: 'line',
            padding: { top: 10, bottom: 10 },
            fixedOverflowWidgets: true,
          }}
        />
      </div>
      <Text id={hintId} size="1" color="gray">
        Ctrl+Enter (⌘+Enter on macOS) sends. Ctrl+Space lists the fields the API accepts here. Inside the editor, Tab
        indents; press Ctrl+M (Ctrl+Shift+M on macOS) to let Tab move focus onward instead.
      </Text>
    </Flex>
  );
}
