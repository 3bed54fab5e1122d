// E-mailed links carry their secret in the fragment (`#token=…`), which browsers never send to
// a server, so it stays out of access logs.

/** The `token` of a URL fragment such as "#token=abc", or undefined. */
export function linkToken(hash: string): string | undefined {
  const token = new URLSearchParams(hash.replace(/^#/, '')).get('token');
  return token ? token : undefined;
}
