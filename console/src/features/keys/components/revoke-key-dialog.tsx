import { ConfirmDialog } from '@/components/confirm-dialog';
import type { components } from '@/lib/api-schema';
import { useRevokeApiKey } from '@/features/keys/api/revoke-api-key';

type ApiKey = components['schemas']['ApiKeyDto'];

type RevokeKeyDialogProps = {
  teamId: string;
  apiKey: ApiKey;
  open: boolean;
  onOpenChange: (open: boolean) => void;
};

export function RevokeKeyDialog({ teamId, apiKey, open, onOpenChange }: RevokeKeyDialogProps) {
  const revoke = useRevokeApiKey(teamId);

  function handleOpenChange(next: boolean) {
    onOpenChange(next);
    if (!next) revoke.reset();
  }

  return (
    <ConfirmDialog
      open={open}
      onOpenChange={handleOpenChange}
      title={`Revoke “${apiKey.name}”?`}
      description={
        <>
          The next request with <code className="ll-scope-code">{apiKey.prefix}</code> is refused. Revoking cannot be undone;
          the service using it will need a new key.
        </>
      }
      confirmLabel="Revoke key"
      cancelLabel="Keep the key"
      pending={revoke.isPending}
      error={revoke.error}
      onConfirm={() => revoke.mutate(apiKey.id, { onSuccess: () => handleOpenChange(false) })}
    />
  );
}
