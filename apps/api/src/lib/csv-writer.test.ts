import { describe, expect, it } from 'vitest';

import { csvCell, csvDocument } from './csv-writer.js';

// Quoting as in RFC 4180; formula defusing as on the OWASP "CSV Injection" page.
describe('csvCell(value)', () => {
  it.each([
    ['plain', 'plain'],
    ['a,b', '"a,b"'],
    ['say "hi"', '"say ""hi"""'],
    ['two\nlines', '"two\nlines"'],
    ['=1+2', "'=1+2"],
    ['+1', "'+1"],
    ['-1', "'-1"],
    ['@SUM(A1)', "'@SUM(A1)"],
    ['\tx', `'\tx`],
    ['\rx', `"'\rx"`],
    ["=cmd|' /C calc'!A0", "'=cmd|' /C calc'!A0"],
    ['=a,"b"', `"'=a,""b"""`],
    [' padded ', '" padded "'],
  ])('csvCell(%j) is %j', (input, expected) => {
    expect(csvCell(input)).toBe(expected);
  });

  it('writes null and undefined as empty cells, numbers as they are', () => {
    expect([csvCell(null), csvCell(undefined), csvCell(42)]).toEqual(['', '', '42']);
  });
});

describe('csvDocument(header, rows)', () => {
  it('ends every line with CRLF, header first', () => {
    expect(csvDocument(['a', 'b'], [[1, 'x,y']])).toBe('a,b\r\n1,"x,y"\r\n');
  });
});
