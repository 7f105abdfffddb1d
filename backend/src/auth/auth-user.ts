/** The signed-in user as the request carries it (from the verified JWT). */
export interface AuthUser {
  readonly id: string;
  readonly email: string;
}
