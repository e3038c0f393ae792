/**
 * A request URL with the secret path segments cut out, for logs: share-link and invitation
 * tokens sit in the path (`/api/shared/<token>`, `/api/invitations/<token>`), and a log line
 * must not hand anyone who reads it a working link.
 */
export function redactUrl(url: string | undefined): string {
  if (!url) return '';
  return url.replace(/^(\/api\/(?:shared|invitations)\/)[^/?#]+/, '$1[token]');
}
