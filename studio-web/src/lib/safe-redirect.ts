// The sign-in page returns people to where they were; only to an address of this app.

/** `target` if it is a path of this site ("/shows/1?x"), else `fallback`. */
export function safeRedirect(target: string | null | undefined, fallback: string): string {
  if (!target || !target.startsWith('/') || target.startsWith('//') || target.includes('\\')) {
    return fallback;
  }
  return target;
}
