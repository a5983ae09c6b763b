import { type Requirements, parseDesign, sampleStepResponse } from '@polecourt/spec';
import { useMemo } from 'react';

import { StepPlot } from '@/components/plots/step-plot';

/**
 * The exact step response of the stored design, sampled here in the browser with the engine,
 * with the revision's limits drawn as guides. Throws on a design the engine refuses: the
 * caller's error boundary shows that instead of the plot.
 */
export function StepResponsePanel({
  design,
  requirements,
  finalValue,
  stable,
}: {
  design: Record<string, unknown>;
  requirements: Requirements;
  finalValue: number | null;
  stable: boolean;
}) {
  const samples = useMemo(() => {
    const model = parseDesign(design);
    const first = sampleStepResponse(model, { maxPoints: 600 });
    // Long enough to show the time limits too, so their guides are not drawn past the curve's end.
    const wanted = Math.max(requirements.maxSettlingTime ?? 0, requirements.maxPeakTime ?? 0) * 1.15;
    const sampled = stable && wanted > first.tEnd ? sampleStepResponse(model, { maxPoints: 600, tEnd: wanted }) : first;
    return sampled.t.map((t, i) => ({ t, y: sampled.y[i] ?? Number.NaN }));
  }, [design, requirements, stable]);

  return (
    <div className="flex flex-col gap-2">
      <StepPlot
        samples={samples}
        finalValue={stable ? finalValue : null}
        settlingBandPct={requirements.settlingBandPct ?? 2}
        maxOvershootPct={stable ? (requirements.maxOvershootPct ?? null) : null}
        maxPeakTime={stable ? (requirements.maxPeakTime ?? null) : null}
        maxSettlingTime={stable ? (requirements.maxSettlingTime ?? null) : null}
        maxRiseTime={stable ? (requirements.maxRiseTime ?? null) : null}
        label={
          stable
            ? 'Exact unit-step response of the candidate, with the settling band, the overshoot ceiling and the time limits of the revision as guides'
            : 'Unit-step response of the candidate: it does not settle, so no limits are drawn'
        }
      />
      <p className="text-xs text-ink-muted">
        {stable
          ? 'The exact response of the whole model (not the second-order estimate), for a unit step at t = 0. The verdict uses times refined on the analytic response, not these samples.'
          : 'The model is not stable: the response grows or keeps oscillating, so it has no overshoot, settling or rise time to measure.'}
      </p>
    </div>
  );
}
