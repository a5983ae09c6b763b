// Where to send someone who must sign in, and where to send them back afterwards.
// Only same-site paths are accepted as a return target, so a crafted link cannot bounce a
// freshly signed-in user to another site ("//evil.example" and "/\evil" are both rejected).

export const SIGN_IN_PATH = '/sign-in';

export function safeRedirectTarget(raw: string | null | undefined): string {
  if (!raw || !raw.startsWith('/') || raw.startsWith('//') || raw.startsWith('/\\')) return '/';
  if (raw === SIGN_IN_PATH || raw.startsWith(`${SIGN_IN_PATH}?`) || raw.startsWith(`${SIGN_IN_PATH}/`)) return '/';
  return raw;
}

export function signInPath(from?: string | null): string {
  const target = safeRedirectTarget(from);
  return target === '/' ? SIGN_IN_PATH : `${SIGN_IN_PATH}?redirectTo=${encodeURIComponent(target)}`;
}
