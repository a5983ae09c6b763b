// `pnpm --filter @polecourt/api bench`: median time to generate and sign one
// compliance report (no database, no archive: the PDF and the signature only).
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';

import { createLocalSigner, loadOrCreateBundle } from '../src/components/reports/local-signer.js';
import { renderReport } from '../src/components/reports/report-pdf.js';
import { sampleReportContent } from './sample-report.js';

const runs = Number(process.env.BENCH_RUNS ?? 15);
const dir = mkdtempSync(path.join(os.tmpdir(), 'polecourt-bench-'));
try {
  const signer = createLocalSigner(loadOrCreateBundle({ dir }));
  const { subject, certificateSha256 } = signer.describe();
  const times: number[] = [];
  let size = 0;
  let pages = 0;
  for (let i = 0; i < runs + 2; i++) {
    const t0 = performance.now();
    const content = sampleReportContent({ subject, certificateSha256 });
    const rendered = await renderReport(content);
    const signed = await signer.sign(rendered.pdf, content.signedAt);
    const ms = performance.now() - t0;
    if (i >= 2) times.push(ms); // the first two warm up fonts and code
    size = signed.length;
    pages = rendered.pages;
    if (i === 0 && process.env.BENCH_OUT) writeFileSync(process.env.BENCH_OUT, signed);
  }
  times.sort((a, b) => a - b);
  const median = times[Math.floor(times.length / 2)]!;
  console.log(`compliance report, generate + sign: median ${median.toFixed(1)} ms over ${runs} runs (min ${times[0]!.toFixed(1)}, max ${times[times.length - 1]!.toFixed(1)}); ${pages} pages, ${(size / 1024).toFixed(1)} KiB; target < 500 ms`);
} finally {
  rmSync(dir, { recursive: true, force: true });
}
