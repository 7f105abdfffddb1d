/** What a Stratochron bearer token says (HS256, signed by the API). */
export interface TokenClaims {
  sub: string;
  email: string;
  /**
   * The user's token epoch when it was issued (`users.token_epoch`). A password change moves the
   * epoch and so ends every older token. Tokens issued before epochs existed have none: epoch 0.
   */
  epoch?: number;
}

/** Whether a token's epoch is still the user's. */
export function epochCurrent(claims: Pick<TokenClaims, 'epoch'>, userEpoch: number | undefined): boolean {
  return userEpoch !== undefined && (claims.epoch ?? 0) === userEpoch;
}
