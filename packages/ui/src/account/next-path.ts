/** Where to go after signing in: only a path inside this app, never another site. */
export function safeNext(raw: string | null): string | undefined {
  if (!raw || !raw.startsWith('/') || raw.startsWith('//') || raw.startsWith('/\\'))
    return undefined;
  return raw;
}

/** `path` carrying the `next` step along, e.g. from sign-in to sign-up. */
export function withNext(
  path: string,
  next: string | undefined,
  extra: Record<string, string> = {},
) {
  const params = new URLSearchParams(extra);
  if (next) params.set('next', next);
  const query = params.toString();
  return query ? `${path}?${query}` : path;
}
