import { graphql } from '@/gql';

export const AcceptInvitationDocument = graphql(`
  mutation AcceptInvitation($input: AcceptInvitationInput!) {
    acceptInvitation(input: $input) {
      token
      user {
        id
        email
        displayName
      }
    }
  }
`);

export const RequestPasswordResetDocument = graphql(`
  mutation RequestPasswordReset($email: String!) {
    requestPasswordReset(email: $email)
  }
`);

export const ResetPasswordDocument = graphql(`
  mutation ResetPassword($input: ResetPasswordInput!) {
    resetPassword(input: $input)
  }
`);

export const ProjectTeamDocument = graphql(`
  query ProjectTeam($id: ID!) {
    project(id: $id) {
      id
      name
      myRole
      myPermissions
      members {
        id
        role
        user {
          id
          email
          displayName
        }
      }
      invitations {
        id
        email
        role
        expiresAt
        acceptedAt
      }
    }
  }
`);

export const InviteMemberDocument = graphql(`
  mutation InviteMember($input: InviteMemberInput!) {
    inviteMember(input: $input) {
      id
      email
      role
      expiresAt
    }
  }
`);

export const SetMemberRoleDocument = graphql(`
  mutation SetMemberRole($input: SetMemberRoleInput!) {
    setMemberRole(input: $input) {
      id
      role
    }
  }
`);

export const RemoveMemberDocument = graphql(`
  mutation RemoveMember($projectId: ID!, $userId: ID!) {
    removeMember(projectId: $projectId, userId: $userId)
  }
`);

export const InvitationLinkDocument = graphql(`
  query InvitationLink($token: String!) {
    invitationLink(token: $token) {
      status
      projectName
    }
  }
`);
