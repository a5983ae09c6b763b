// The running worker, so enqueueMail can wake it without importing the server.
let kick: (() => void) | null = null;

export function registerMailWorker(kickFn: (() => void) | null): void {
  kick = kickFn;
}

export function kickMailWorker(): void {
  kick?.();
}
