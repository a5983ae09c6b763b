import { Alert } from '@/components/ui/alert';

/** Shown on every assessment view and every report page: a model check is not a safety case. */
export function SafetyCaution() {
  return (
    <Alert tone="caution" title="A compliant model is not a safety case">
      <p>
        Polecourt checks a linear closed-loop model against transient limits. Saturation, rate limits, sampling,
        delays, nonlinear friction and model error can all change how the real equipment responds. Designs for
        equipment that can hurt people must be verified on hardware and reviewed under the applicable
        functional-safety standards and local codes by qualified, licensed engineers.
      </p>
    </Alert>
  );
}
