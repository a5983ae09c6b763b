// The caution every report carries (the product's standing caution, in the
// report's words). Kept in one place so the PDF and its tests agree.
export const REPORT_CAUTION_TITLE = 'A compliant model is not a safety case';

export const REPORT_CAUTION_TEXT =
  'This report shows that a linear closed-loop model meets transient limits. Compliance of a linear ' +
  'closed-loop model with transient limits is not a safety case: saturation, rate limits, sampling, delays, ' +
  'nonlinear friction and model error can change the real response. Designs for equipment that can hurt ' +
  'people must be verified on hardware and reviewed under the applicable functional-safety standards and ' +
  'local codes by qualified, licensed engineers.';
