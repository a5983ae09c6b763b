import type { ReportArchive } from './archive.js';
import type { Signer } from './signer.js';

// The signer and the archive are set up once by server.ts start() and
// reached by the use cases through here, so either can be swapped (a hosted
// signing service, a real bucket) without touching the use cases.

export interface ReportServices {
  signer: Signer;
  archive: ReportArchive;
}

let current: ReportServices | null = null;

export function setReportServices(services: ReportServices | null): void {
  current = services;
}

export function reportServices(): ReportServices {
  if (!current) throw new Error('Report services are not set up (server.ts start() does it)');
  return current;
}
