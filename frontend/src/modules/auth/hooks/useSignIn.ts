import { useMutation, useQueryClient } from '@tanstack/react-query';
import { SignInDocument } from '@/modules/auth/graphql/auth';
import { graphqlRequest } from '@/modules/api/utils/graphqlClient';
import { sessionStore } from '@/modules/auth/utils/sessionStore';

export type SignInVariables = { email: string; password: string };

/** Sign in and keep the token; the cache is emptied so nothing of a previous user remains. */
export function useSignIn() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async ({ email, password }: SignInVariables) =>
      (await graphqlRequest(SignInDocument, { email: email.trim(), password })).signIn,
    onSuccess: ({ token, user }) => {
      queryClient.clear();
      sessionStore.set({ token, user: { id: user.id, email: user.email, displayName: user.displayName } });
    },
  });
}

/** Sign out: forget the token and everything fetched with it. */
export function useSignOut(): () => void {
  const queryClient = useQueryClient();
  return () => {
    sessionStore.clear();
    queryClient.clear();
  };
}
