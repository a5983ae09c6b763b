// Hard cap on the number of poles (and zeros) a design may have. Root finding
// and partial fractions cost O(n^2) and double precision coefficients of a
// polynomial this long are already near overflow, so larger inputs are
// refused up front instead of grinding.
export const MAX_MODEL_ORDER = 200;
