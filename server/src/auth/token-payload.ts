/** What an Upwell access token carries. */
export interface TokenPayload {
  /** The user's id. */
  sub: string;
  /** The user's token version when it was issued; sign-out raises it. */
  ver: number;
}
