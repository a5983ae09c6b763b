// A small benchmark page for the s-plane plot: 10,000 poles, redrawn on demand, each redraw
// timed with the Performance API from the state change to the next painted frame. Not in the
// navigation; open /bench/splane-plot. It changes nothing on the server.
import type { Viewport } from '@polecourt/plots';
import { useMemo, useRef, useState } from 'react';
import { flushSync } from 'react-dom';

import { SplanePlot } from '@/components/plots/splane-plot';
import { Button } from '@/components/ui/button';
import { PageHeader } from '@/components/ui/page-header';
import { formatNumber } from '@/lib/format';

const REQUIREMENTS = { maxOvershootPct: 10, maxSettlingTime: 1.2, maxRiseTime: 0.3, maxNaturalFrequency: 20, dominanceRatio: 5 };
const BASE: Viewport = { reMin: -30, reMax: 5, imMin: -20, imMax: 20 };

// A fixed pseudo-random cloud (linear congruential generator), the same on every load.
function cloud(n: number) {
  let seed = 12345;
  const next = () => {
    seed = (seed * 1103515245 + 12345) % 2147483648;
    return seed / 2147483648;
  };
  return Array.from({ length: n }, () => ({ re: -next() * 30, im: (next() - 0.5) * 40 }));
}

const nextFrame = () => new Promise<void>((resolve) => requestAnimationFrame(() => setTimeout(resolve, 0)));

export default function SplaneBenchRoute() {
  const [count, setCount] = useState(10_000);
  const poles = useMemo(() => cloud(count), [count]);
  const [shift, setShift] = useState(0);
  const [result, setResult] = useState<{ median: number; max: number; runs: number; commit: number; count: number } | null>(null);
  const [running, setRunning] = useState(false);
  // The plot reports each commit (render start to layout effect): the JavaScript part of a redraw.
  const commits = useRef<number[]>([]);
  const viewport = useMemo(() => ({ ...BASE, reMin: BASE.reMin + shift, reMax: BASE.reMax + shift }), [shift]);

  const measure = async () => {
    setRunning(true);
    performance.clearMeasures('splane-redraw');
    commits.current = [];
    const runs = 20;
    for (let i = 1; i <= runs; i++) {
      performance.mark('splane-redraw-start');
      flushSync(() => setShift((i % 2) * 0.5));
      await nextFrame();
      performance.measure('splane-redraw', 'splane-redraw-start');
    }
    const times = performance
      .getEntriesByName('splane-redraw')
      .map((e) => e.duration)
      .sort((a, b) => a - b);
    const js = [...commits.current].sort((a, b) => a - b);
    setResult({ median: times[Math.floor(times.length / 2)] ?? 0, max: times[times.length - 1] ?? 0, runs: times.length, commit: js[Math.floor(js.length / 2)] ?? 0, count });
    setRunning(false);
  };

  return (
    <>
      <title>s-plane plot benchmark · Polecourt</title>
      <PageHeader title="s-plane plot benchmark" lead="Redraw time of the s-plane plot with many poles, measured in this browser." />
      <div className="flex flex-col gap-4">
        <div className="flex flex-wrap items-center gap-3">
          <label className="flex items-center gap-2 text-sm">
            Poles
            <select value={count} onChange={(e) => setCount(Number(e.target.value))} className="rounded border border-rule-strong bg-paper-raised px-2 py-1">
              {[100, 1000, 10_000, 50_000].map((n) => (
                <option key={n} value={n}>
                  {n}
                </option>
              ))}
            </select>
          </label>
          <Button variant="primary" busy={running} onClick={() => void measure()}>
            Measure 20 redraws
          </Button>
          <p role="status" data-testid="bench-result" className="text-sm tabular-nums">
            {result ? `median ${formatNumber(result.median, 3)} ms, slowest ${formatNumber(result.max, 3)} ms over ${result.runs} redraws of ${result.count} poles (render and commit: median ${formatNumber(result.commit, 3)} ms)` : ''}
          </p>
        </div>
        <SplanePlot title={`${count} poles`} requirements={REQUIREMENTS} poles={poles} viewport={viewport} height={520} onRedraw={(ms) => running && commits.current.push(ms)} />
      </div>
    </>
  );
}
