// Where links in messages point. Set once at start (server.ts), because the
// app's own address is known only after it has a port.
let publicUrl = 'http://127.0.0.1:5180';

export function setPublicUrl(url: string): void {
  publicUrl = url.replace(/\/+$/, '');
}

export function getPublicUrl(): string {
  return publicUrl;
}

/** A path such as "/set-password?token=..." becomes an absolute link; absolute URLs pass unchanged. */
export function absoluteLink(pathOrUrl: string): string {
  if (/^https?:\/\//i.test(pathOrUrl)) return pathOrUrl;
  return `${publicUrl}${pathOrUrl.startsWith('/') ? '' : '/'}${pathOrUrl}`;
}
