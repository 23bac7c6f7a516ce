import { Button } from '@blueprintjs/core';
import { LogOutIcon } from '@blueprintjs/icons';
import { useSignOut } from '../api/use-sign-out';

export function SignOutButton() {
  const signOut = useSignOut();
  return <Button variant="minimal" icon={<LogOutIcon />} text="Sign out" loading={signOut.isPending} onClick={() => signOut.mutate()} />;
}
