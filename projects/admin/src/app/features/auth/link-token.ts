/** Same shape the API accepts for e-mailed link codes; checked here so a cut-off link is named at once. */
const LINK_TOKEN = /^[A-Za-z0-9_-]{32,128}$/;

export function isWellFormedToken(token: string | undefined): token is string {
  return typeof token === 'string' && LINK_TOKEN.test(token);
}
