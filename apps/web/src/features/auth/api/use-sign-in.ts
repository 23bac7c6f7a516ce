import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { components } from '../../../lib/api-schema';
import { expectData, http } from '../../../lib/http';
import { session } from '../../../lib/session';

export type Credentials = components['schemas']['SignInDto'];

export function useSignIn() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: Credentials) => expectData(http.POST('/api/auth/login', { body })),
    onSuccess: (view) => {
      // Nothing cached for a previous person may show to the next one at a shared desk.
      queryClient.clear();
      session.start(view);
    },
  });
}
