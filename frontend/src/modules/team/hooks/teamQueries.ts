import { queryOptions } from '@tanstack/react-query';
import { graphqlRequest } from '@/modules/api/utils/graphqlClient';
import { useGraphqlMutation } from '@/modules/api/hooks/useGraphqlMutation';
import { projectQueries } from '@/modules/projects/hooks/projectQueries';
import { InvitationLinkDocument, InviteMemberDocument, ProjectTeamDocument, RemoveMemberDocument, SetMemberRoleDocument } from '@/modules/team/graphql/team';

/** Query keys and options for a project's members and invitations, under the project's prefix. */
export const teamQueries = {
  /** What an invitation link can still do (public, asked before its form is shown). */
  invitationLink: (token: string) =>
    queryOptions({
      queryKey: ['invitation-link', token] as const,
      queryFn: async () => (await graphqlRequest(InvitationLinkDocument, { token })).invitationLink,
      staleTime: 0,
    }),
  all: (projectId: string) => [...projectQueries.detail(projectId), 'team'] as const,
  team: (projectId: string) =>
    queryOptions({
      queryKey: [...teamQueries.all(projectId), 'members'] as const,
      queryFn: async () => (await graphqlRequest(ProjectTeamDocument, { id: projectId })).project,
    }),
};

/** Invite, change a role, remove: each refreshes the team lists (and the audit trail). */
export function useTeamMutations(projectId: string) {
  const invalidates = [teamQueries.all(projectId), [...projectQueries.detail(projectId), 'audit']] as const;
  return {
    invite: useGraphqlMutation(InviteMemberDocument, { invalidates }),
    setRole: useGraphqlMutation(SetMemberRoleDocument, { invalidates }),
    remove: useGraphqlMutation(RemoveMemberDocument, { invalidates }),
  };
}
