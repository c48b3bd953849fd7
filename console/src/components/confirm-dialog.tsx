import { AlertDialog, Button, Flex } from '@radix-ui/themes';
import type { ReactNode } from 'react';
import { ProblemCallout } from '@/components/problem-callout';

type ConfirmDialogProps = {
  open: boolean;
  onOpenChange: (open: boolean) => void;
  title: string;
  description: ReactNode;
  confirmLabel: string;
  cancelLabel?: string;
  tone?: 'red' | 'jade';
  pending: boolean;
  error: unknown;
  onConfirm: () => void;
  children?: ReactNode;
};

// Asks before an action that cannot be taken back; the refusal, if any, is shown in the dialog itself.
export function ConfirmDialog({
  open,
  onOpenChange,
  title,
  description,
  confirmLabel,
  cancelLabel = 'Cancel',
  tone = 'red',
  pending,
  error,
  onConfirm,
  children,
}: ConfirmDialogProps) {
  return (
    <AlertDialog.Root open={open} onOpenChange={onOpenChange}>
      <AlertDialog.Content maxWidth="480px">
        <AlertDialog.Title>{title}</AlertDialog.Title>
        <AlertDialog.Description size="2">{description}</AlertDialog.Description>
        {children}
        <ProblemCallout error={error} />
        <Flex gap="3" mt="4" justify="end">
          <AlertDialog.Cancel>
            <Button variant="soft" color="gray">
              {cancelLabel}
            </Button>
          </AlertDialog.Cancel>
          <Button color={tone} loading={pending} onClick={onConfirm}>
            {confirmLabel}
          </Button>
        </Flex>
      </AlertDialog.Content>
    </AlertDialog.Root>
  );
}
