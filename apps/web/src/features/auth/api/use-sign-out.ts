import { useMutation } from '@tanstack/react-query';
import { session } from '../../../lib/session';

/** Ends the session here and on the server; the app shell then returns to the sign-in page. */
export function useSignOut() {
  return useMutation({ mutationFn: () => session.signOut() });
}
