import { CheckIcon, CopyIcon } from '@radix-ui/react-icons';
import { Button } from '@radix-ui/themes';
import { useEffect, useState } from 'react';

type CopyButtonProps = {
  value: string;
  label?: string;
};

type CopyState = 'idle' | 'copied' | 'failed';

export function CopyButton({ value, label = 'Copy' }: CopyButtonProps) {
  const [state, setState] = useState<CopyState>('idle');

  useEffect(() => {
    if (state === 'idle') return undefined;
    const timer = window.setTimeout(() => setState('idle'), 2500);
    return () => window.clearTimeout(timer);
  }, [state]);

  async function copy() {
    try {
      await navigator.clipboard.writeText(value);
      setState('copied');
    } catch {
      // Clipboard access can be refused (permissions, insecure origin); the value stays selectable.
      setState('failed');
    }
  }

  return (
    <>
      <Button type="button" variant="soft" onClick={copy}>
        {state === 'copied' ? <CheckIcon aria-hidden="true" /> : <CopyIcon aria-hidden="true" />}
        {state === 'copied' ? 'Copied' : label}
      </Button>
      <span role="status" aria-live="polite" className="ll-visually-hidden">
        {state === 'copied' ? 'Copied to the clipboard' : state === 'failed' ? 'Copying failed; select the text and copy it yourself' : ''}
      </span>
    </>
  );
}
