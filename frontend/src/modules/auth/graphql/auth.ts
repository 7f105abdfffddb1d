import { graphql } from '@/gql';

export const SignInDocument = graphql(`
  mutation SignIn($email: String!, $password: String!) {
    signIn(email: $email, password: $password) {
      token
      user {
        id
        email
        displayName
      }
    }
  }
`);

export const MeDocument = graphql(`
  query Me {
    me {
      id
      email
      displayName
    }
  }
`);
