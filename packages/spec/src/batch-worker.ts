// Worker thread of `polecourt batch`: assesses the blocks the main thread sends.
import { parentPort, workerData } from 'node:worker_threads';

import { assessJsonBlock } from './assess-json-block.js';
import type { ResolvedRequirements } from './parse-requirements.js';

const req = (workerData as { req: ResolvedRequirements | null }).req;

parentPort?.on('message', (msg: { id: number; lines: string[]; first: number }) => {
  parentPort?.postMessage({ id: msg.id, ...assessJsonBlock(msg.lines, msg.first, req) });
});
