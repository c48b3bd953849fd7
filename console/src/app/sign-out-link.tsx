import { Button } from '@radix-ui/themes';
import { useNavigate } from 'react-router-dom';
import { paths } from '@/config/paths';
import { useSignOut } from '@/features/auth/api/sign-out';

export function SignOutLink() {
  const signOut = useSignOut();
  const navigate = useNavigate();
  return (
    <Button
      variant="ghost"
      size="2"
      loading={signOut.isPending}
      onClick={() => signOut.mutate(undefined, { onSettled: () => navigate(paths.signIn, { replace: true }) })}
    >
      Sign out
    </Button>
  );
}
