// fontkit ships no type declarations; the report only creates fonts with it
// and hands them to pdfkit, which accepts a fontkit font in place of a file.
declare module 'fontkit' {
  export function create(buffer: Uint8Array, postscriptName?: string): { layout: (...args: unknown[]) => unknown };
}
