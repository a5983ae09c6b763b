// A small logger: the API's only console output, silenced in tests.
type Level = 'silent' | 'error' | 'info';
let level: Level = 'info';

export const logger = {
  setLevel(l: Level): void {
    level = l;
  },
  info(message: string): void {
    if (level === 'info') console.log(`[polecourt] ${message}`);
  },
  error(message: string, err?: unknown): void {
    if (level === 'silent') return;
    console.error(`[polecourt] ${message}`, err instanceof Error ? err.stack : (err ?? ''));
  },
};
