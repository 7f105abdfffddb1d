import { useMutation, useQueryClient } from '@tanstack/react-query';
import { graphqlRequest } from '@/modules/api/utils/graphqlClient';
import { sessionStore } from '@/modules/auth/utils/sessionStore';
import { ProjectsDocument } from '@/modules/projects/graphql/projects';
import { landingProjectId } from '@/modules/team/utils/teamForms';
import { AcceptInvitationDocument, RequestPasswordResetDocument, ResetPasswordDocument } from '@/modules/team/graphql/team';

export type AcceptInvitationVariables = { token: string; password: string; displayName: string };

/**
 * Redeem an invitation link and keep the token it answers with (the person is signed in);
 * resolves with the project to land in, or null when the new session has several.
 */
export function useAcceptInvitation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async ({ token, password, displayName }: AcceptInvitationVariables): Promise<string | null> => {
      const { acceptInvitation } = await graphqlRequest(AcceptInvitationDocument, {
        input: { token, password, displayName: displayName.trim() === '' ? null : displayName.trim() },
      });
      queryClient.clear();
      const { user } = acceptInvitation;
      sessionStore.set({ token: acceptInvitation.token, user: { id: user.id, email: user.email, displayName: user.displayName } });
      // Asked as the new session: the payload's own user.memberships cannot be resolved there.
      const { projects } = await graphqlRequest(ProjectsDocument, {});
      return landingProjectId(projects.map((project) => ({ project })));
    },
  });
}

/** Ask for a reset e-mail; the server answers true whether or not the address has an account. */
export function useRequestPasswordReset() {
  return useMutation({
    mutationFn: async (email: string) => (await graphqlRequest(RequestPasswordResetDocument, { email: email.trim() })).requestPasswordReset,
  });
}

/** Set a new password from a reset link's token. */
export function useResetPassword() {
  return useMutation({
    mutationFn: async ({ token, password }: { token: string; password: string }) =>
      (await graphqlRequest(ResetPasswordDocument, { input: { token, password } })).resetPassword,
  });
}
