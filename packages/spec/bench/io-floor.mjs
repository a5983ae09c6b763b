// The floor of any JSON-lines batch on this machine: a process that reads the
// bench's designs, parses each line and writes one assessment-shaped JSON
// object per line (the contract's fields, 64 full-precision numbers, the same
// two notes), in blocks of 250 lines as `polecourt batch` does, and does no
// engine work at all. Its wall time is what process start, JSON parsing and
// JSON output cost before a single pole is looked at.
// Usage: node bench/io-floor.mjs DESIGNS.jsonl REQUIREMENTS.json > /dev/null
import { readFileSync } from 'node:fs';

// One check per limit of the bench's requirement set, as the batch writes them.
const LIMITS = Object.entries(JSON.parse(readFileSync(process.argv[3], 'utf8')));
const NOTES = [
  'the poles at -16.32 ± 47.95j are only 4.2x farther left than the dominant pair (5x needed)',
  'the second-order estimate of settling time is off by 32.9 % (1.04 s against 0.779 s exact)',
];

// A full-precision number that differs from line to line, as real results do.
const num = (x, f) => x * f + 1e-9;
const copy = (q) => ({ re: q.re, im: q.im });

function fakeAssessment(d) {
  const p = d.poles;
  const checks = LIMITS.map(([requirement, limit]) => ({
    requirement,
    limit,
    effectiveLimit: limit,
    value: num(p[3].re, -0.0477 * limit),
    estimate: num(p[3].im, 0.0213 * limit),
    status: 'pass',
    marginPct: num(p[5].re, -0.9077),
  }));
  return {
    id: d.id,
    stable: true,
    dcGain: num(d.gain, 1 / d.gain),
    poles: p.map(copy),
    zeros: (d.zeros ?? []).map(copy),
    metrics: {
      finalValue: num(d.gain, 1 / d.gain),
      overshootPct: num(p[0].re, -0.47),
      undershootPct: 0,
      peakTime: num(p[0].im, 0.353),
      settlingTime: num(p[1].re, -0.2017),
      settlingBandPct: 2,
      riseTime: num(p[2].re, -0.0301),
    },
    dominant: {
      poles: [copy(p[0]), copy(p[1])],
      dampingRatio: num(p[0].re, -0.2036),
      naturalFrequency: num(p[0].im, 1.619),
      ratio: num(p[2].re, 0.2588),
      zeroRatio: num(p[4].re, 0.4124),
      approximationValid: false,
      notes: NOTES,
    },
    estimate: {
      overshootPct: num(p[0].re, -0.4736),
      peakTime: num(p[0].im, 0.3415),
      settlingTime: num(p[1].re, -0.268),
      riseTime: num(p[2].re, -0.0294),
    },
    regionPass: false,
    checks,
    verdict: 'noncompliant',
    notes: [],
    engineVersion: '0.0.0',
  };
}

let out = [];
for (const line of readFileSync(process.argv[2], 'utf8').split('\n')) {
  if (!line) continue;
  out.push(JSON.stringify(fakeAssessment(JSON.parse(line))));
  if (out.length === 250) {
    process.stdout.write(out.join('\n') + '\n');
    out = [];
  }
}
if (out.length) process.stdout.write(out.join('\n') + '\n');
