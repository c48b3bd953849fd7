import '@/lib/monaco-setup';
import Editor from '@monaco-editor/react';
import { Flex, Text } from '@radix-ui/themes';
import { useAppearance } from '@/components/appearance';
import { PageLoading } from '@/components/page-loading';

type RequestEditorProps = {
  value: string;
  onChange: (next: string) => void;
  hintId: string;
};

export function RequestEditor({ value, onChange, hintId }: RequestEditorProps) {
  const { appearance } = useAppearance();

  return (
    <Flex direction="column" gap="2">
      <div className="ll-editor-frame">
        <Editor
          height="260px"
          language="json"
          path="request.json"
          value={value}
          onChange={(next) => onChange(next ?? '')}
          theme={appearance === 'dark' ? 'vs-dark' : 'vs'}
          loading={<PageLoading />}
          options={{
            ariaLabel: 'Regression request, JSON',
            fontFamily: "'Fira Code', ui-monospace, monospace",
            fontSize: 13,
            lineHeight: 20,
            minimap: { enabled: false },
            scrollBeyondLastLine: false,
            automaticLayout: true,
            tabSize: 2,
            renderLineHighlight: 'line',
            padding: { top: 10, bottom: 10 },
          }}
        />
      </div>
      <Text id={hintId} size="1" color="gray">
        Inside the editor, Tab indents. Press Ctrl+M (Ctrl+Shift+M on macOS) to let Tab move focus onward instead.
      </Text>
    </Flex>
  );
}
