// The exact unit-step response of a model, from its modal form: y(t) and
// dy/dt in closed form (sums of t^n e^{sigma t} cos/sin terms), the final
// value G(0) and the initial value y(0+) = D. y(t) = 0 for t < 0.
import type { Model } from './types.js';
import { conditionedModalForm } from './conditioned-modal-form.js';
import type { ModalForm } from './partial-fractions.js';
import { packResponse, type PackedResponse } from './pack-response.js';
import { evalResponse } from './eval-response.js';
import { dcGain } from './dc-gain.js';

export interface StepResponse {
  value(t: number): number;
  derivative(t: number): number;
  /** G(0), or null when G has a pole at the origin. */
  finalValue: number | null;
  /** y(0+) = D, the direct feedthrough (0 for a strictly proper model). */
  initialValue: number;
  modal: ModalForm;
  /** The modal form packed for fast evaluation, in the units of y. */
  packed: PackedResponse;
}

export function stepResponse(model: Model): StepResponse {
  const finalValue = dcGain(model);
  const modal = conditionedModalForm(model, finalValue).form;
  const packed = packResponse(modal, 1);
  const out = new Float64Array(2);
  return {
    value(t: number): number {
      if (t < 0) return 0;
      evalResponse(packed, t, 1, out);
      return out[0] as number;
    },
    derivative(t: number): number {
      if (t < 0) return 0;
      evalResponse(packed, t, 2, out);
      return out[1] as number;
    },
    finalValue,
    initialValue: modal.feedthrough,
    modal,
    packed,
  };
}
