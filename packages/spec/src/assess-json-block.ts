// One block of batch input lines (JSON designs) to one block of output lines
// (an assessment or an error object each). Shared by the CLI's main thread
// and its worker threads, so both answer a line the same way.
import { assessModel } from './assess-model.js';
import { parseDesign } from './parse-design.js';
import type { ResolvedRequirements } from './parse-requirements.js';
import { SpecInputError } from './spec-input-error.js';

export interface BlockResult {
  text: string;
  allGood: boolean;
  internalErrors: string[];
}

export function assessJsonBlock(lines: string[], firstLineNo: number, req: ResolvedRequirements | null): BlockResult {
  const out: string[] = new Array(lines.length);
  let allGood = true;
  const internalErrors: string[] = [];
  for (let i = 0; i < lines.length; i++) {
    const lineNo = firstLineNo + i;
    let line = lines[i] as string;
    if (line.endsWith('\r')) line = line.slice(0, -1);
    if (lineNo === 1 && line.charCodeAt(0) === 0xfeff) line = line.slice(1);
    try {
      let design: unknown;
      try {
        design = JSON.parse(line);
      } catch (e) {
        throw new SpecInputError('invalid_json', `Line ${lineNo} is not valid JSON: ${(e as Error).message}`, '');
      }
      const a = assessModel(parseDesign(design), req);
      if (a.verdict === 'noncompliant') allGood = false;
      out[i] = JSON.stringify(a);
    } catch (e) {
      allGood = false;
      let err: { code: string; message: string; path?: string };
      if (e instanceof SpecInputError) err = { code: e.code, message: e.message, path: e.path };
      else {
        err = { code: 'internal_error', message: `Internal error: ${e instanceof Error ? e.message : String(e)}` };
        internalErrors.push(`line ${lineNo}: ${err.message}`);
      }
      out[i] = JSON.stringify({ error: { ...err, line: lineNo } });
    }
  }
  return { text: lines.length ? out.join('\n') + '\n' : '', allGood, internalErrors };
}
