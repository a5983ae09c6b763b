// The one error the engine throws: bad input, caught at the edge.
// `path` names the field ("poles[2].im", "maxOvershootPct").
export class SpecInputError extends Error {
  readonly code: string;
  readonly path: string;

  constructor(code: string, message: string, path = '') {
    super(message);
    this.name = 'SpecInputError';
    this.code = code;
    this.path = path;
  }
}
