// Whether this browser has signed in and not since signed out or met a 401. Only a hint: the
// httpOnly session cookie decides, and scripts cannot read it. The hint spares the signed-out
// a "who am I?" request that could only answer 401 on every page they open.

const KEY = 'overshoot.session';

function storage(): Storage | undefined {
  try {
    return globalThis.localStorage;
  } catch {
    // Storage can be blocked by the browser's privacy settings; then always ask the API.
    return undefined;
  }
}

/** True unless this browser is known to be signed out. */
export function mayBeSignedIn(): boolean {
  const store = storage();
  return store ? store.getItem(KEY) === 'yes' : true;
}

/** Records that this browser signed in (true) or out (false). */
export function rememberSignedIn(signedIn: boolean): void {
  const store = storage();
  if (!store) return;
  if (signedIn) store.setItem(KEY, 'yes');
  else store.removeItem(KEY);
}
