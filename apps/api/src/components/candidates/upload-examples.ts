// The example files served at /api/candidates/upload-example.csv and .json.
// Invented designs; the format is described in docs/candidate-upload-format.md.

export const UPLOAD_EXAMPLE_CSV = [
  'name,notes,gain,poles,zeros,numerator,denominator',
  'VP-20 stem loop A,"third-order, far real pole",1560,-4±6j -30,,,',
  'VP-20 stem loop B (lead),zero ahead of the pair,55.625,-5+8j;-5-8j;-25,-40,,',
  'VP-20 stem loop C (coefficients),same loop as A written as a polynomial,,,,1560,1 38 292 1560',
  '',
].join('\n');

export const UPLOAD_EXAMPLE_JSON = `${JSON.stringify(
  {
    candidates: [
      {
        name: 'VP-20 stem loop A',
        notes: 'third-order, far real pole',
        design: { poles: [{ re: -4, im: 6 }, { re: -4, im: -6 }, { re: -30, im: 0 }], zeros: [], gain: 1560 },
      },
      {
        name: 'VP-20 stem loop C (coefficients)',
        notes: 'same loop as A written as a polynomial',
        design: { numerator: [1560], denominator: [1, 38, 292, 1560] },
      },
    ],
  },
  null,
  2,
)}\n`;
