import { REPORT_MEANING_LABELS, REPORT_MEANING_STATEMENTS, REQUIREMENT_WORDS, type PersonRef } from '@polecourt/contracts';
import { plotFrame, splanePlot, splaneViewport, stepPlot } from '@polecourt/plots';
import type { Check, Complex } from '@polecourt/spec';
import { pdfkitAddPlaceholder } from '@signpdf/placeholder-pdfkit';

import { REPORT_CAUTION_TEXT, REPORT_CAUTION_TITLE } from './caution.js';
import { drawSplane, drawStep } from './draw-plots.js';
import { CONTENT_WIDTH, INK, Layout, PAGE, type Cell, type Column, type TextStyle } from './pdf-kit.js';

// Hashes are set a little smaller so 64 hex digits stay on one line.
const HASH: TextStyle = { size: 8.2 };
import { evidenceOf, type ReportContent } from './report-content.js';

// The compliance report: title block, verdict, signature block and caution
// on the first page; the candidate model and both plots; the checks and the
// dominance notes; the revision's limit-by-limit diff, the audit-chain head
// and the evidence file. A footer on every page. The result carries an
// empty signature placeholder for the signer to fill.

export const S_PLANE_BOX = { width: CONTENT_WIDTH, height: 310 };
export const STEP_BOX = { width: CONTENT_WIDTH, height: 220 };


/** 4 significant figures, no trailing zeros, with a unit when given. */
export function num(v: number | null | undefined, unit = ''): string {
  if (v === null || v === undefined || !Number.isFinite(v)) return '-';
  const s = v === 0 ? '0' : String(Number(v.toPrecision(4)));
  return unit ? `${s} ${unit}` : s;
}

export function utc(iso: string | Date | null | undefined): string {
  if (!iso) return '-';
  const d = typeof iso === 'string' ? new Date(iso) : iso;
  return `${d.toISOString().slice(0, 19).replace('T', ' ')} UTC`;
}

function person(p: PersonRef | null | undefined): string {
  return p ? `${p.name} (${p.email})` : 'unknown';
}

function shortHash(h: string): string {
  return h.length > 16 ? `${h.slice(0, 12)}…${h.slice(-4)}` : h;
}

/** Roots as engineers write them: a conjugate pair once as "-2 ± j3". */
export function roots(list: readonly Complex[]): string {
  if (list.length === 0) return 'none';
  const out: string[] = [];
  for (const z of list) {
    if (z.im < 0 && list.some((w) => w.re === z.re && w.im === -z.im)) continue;
    out.push(z.im === 0 ? num(z.re) : `${num(z.re)} ± j${num(Math.abs(z.im))}`);
  }
  return out.join(';  ');
}

function limitText(requirement: string, limit: number): string {
  const w = REQUIREMENT_WORDS[requirement];
  if (!w) return `${requirement} ${num(limit)}`;
  const word = w.kind === 'max' ? 'at most' : w.kind === 'min' ? 'at least' : '';
  return `${w.name}, ${word} ${num(limit, w.unit)}`.replace(/\s+/g, ' ').trim();
}

function statusCell(status: Check['status']): Cell {
  if (status === 'pass') return { text: 'Pass', color: INK.pass, weight: 'semibold', fill: INK.passSoft };
  if (status === 'fail') return { text: 'Fail', color: INK.fail, weight: 'semibold', fill: INK.failSoft };
  return { text: 'Not applicable', color: INK.muted };
}

function verdictWords(v: string | null): { word: string; color: string; fill: string } {
  return v === 'compliant'
    ? { word: 'Compliant', color: INK.pass, fill: INK.passSoft }
    : { word: 'Not compliant', color: INK.fail, fill: INK.failSoft };
}

function designRows(design: Record<string, unknown>, result: ReportContent['assessment']['result']): [string, string][] {
  const rows: [string, string][] = [];
  if (Array.isArray(design.poles)) {
    rows.push(['Form', 'zero-pole-gain, G(s) = k · prod(s - z) / prod(s - p)']);
    rows.push(['Poles', roots(design.poles as Complex[])]);
    rows.push(['Zeros', roots((design.zeros as Complex[] | undefined) ?? [])]);
    rows.push(['Gain k', num(design.gain as number)]);
  } else {
    rows.push(['Form', 'polynomial coefficients, highest power first']);
    rows.push(['Numerator', ((design.numerator as number[] | undefined) ?? []).map((c) => num(c)).join(', ')]);
    rows.push(['Denominator', ((design.denominator as number[] | undefined) ?? []).map((c) => num(c)).join(', ')]);
    rows.push(['Poles (computed)', roots(result.poles)]);
    rows.push(['Zeros (computed)', roots(result.zeros)]);
  }
  rows.push(['DC gain G(0)', num(result.dcGain)]);
  rows.push(['Stable', result.stable ? 'yes: every pole in the left half-plane' : 'no: a pole on or right of the imaginary axis']);
  return rows;
}

function impactSummary(c: ReportContent): string {
  const i = c.revision.impact;
  if (!i) return 'No revision impact was recorded with the approval.';
  const base = i.baselineRevisionId === null ? 'with no earlier approved revision to compare' : `against the revision it replaced (id ${i.baselineRevisionId})`;
  const changed = i.changed.length === 0
    ? 'none changes verdict'
    : `${i.changed.length} ${i.changed.length === 1 ? 'changes' : 'change'} verdict: ${i.changed
        .map((x) => `${x.name} (${x.from ?? 'not assessed'} to ${x.to})`)
        .join('; ')}`;
  return `Acknowledged ${utc(i.acknowledgedAt)}: ${i.total} ${i.total === 1 ? 'candidate' : 'candidates'} of the product line assessed ${base}; ${changed}.`;
}

export interface RenderedReport {
  /** The PDF with an empty signature placeholder, ready for the signer. */
  pdf: Buffer;
  evidence: Buffer;
  pages: number;
}

export async function renderReport(c: ReportContent): Promise<RenderedReport> {
  const result = c.assessment.result;
  const verdict = verdictWords(result.verdict);
  const layout = new Layout({
    title: `Compliance report ${c.number}`,
    author: c.signer.name,
    subject: `${c.candidate.name} against ${c.requirementSet.name} revision ${c.revision.number}: ${verdict.word.toLowerCase()}`,
    createdAt: c.signedAt,
  });
  const { doc } = layout;
  layout.setPageHeader((l) => {
    l.line(`Polecourt compliance report ${c.number}`, PAGE.left, 34, { size: 7.5, color: INK.muted });
    l.line(`${c.productLine.name} · ${c.candidate.name}`, PAGE.left + CONTENT_WIDTH, 34, { size: 7.5, color: INK.muted }, 'right');
    l.doc.moveTo(PAGE.left, 46).lineTo(PAGE.left + CONTENT_WIDTH, 46).lineWidth(0.4).strokeColor(INK.rule).stroke();
  });

  // ---- page 1: title block, verdict, signature, caution --------------------
  layout.addPage();
  layout.line('COMPLIANCE REPORT', PAGE.left, layout.y, { size: 8, weight: 'semibold', color: INK.accent });
  layout.y += 14;
  layout.line(c.number, PAGE.left, layout.y, { size: 22, weight: 'semibold' });
  // The verdict, as a word on its colour, top right.
  const badgeW = 150;
  doc.rect(PAGE.left + CONTENT_WIDTH - badgeW, layout.y - 2, badgeW, 30).fill(verdict.fill);
  layout.line('VERDICT', PAGE.left + CONTENT_WIDTH - badgeW + 10, layout.y + 1, { size: 6.5, weight: 'semibold', color: verdict.color });
  layout.line(verdict.word, PAGE.left + CONTENT_WIDTH - badgeW + 10, layout.y + 10, { size: 12.5, weight: 'semibold', color: verdict.color });
  layout.y += 34;
  layout.text(`${c.candidate.name} assessed against ${c.requirementSet.name}, revision ${c.revision.number}`, { size: 12, weight: 'medium' }, { gapAfter: 10 });

  layout.section('What was assessed');
  const approval = c.revision.approver
    ? `Approved by ${person(c.revision.approver)} on ${utc(c.revision.approvedAt)}`
    : `Approved on ${utc(c.revision.approvedAt)}`;
  layout.keyValues([
    ['Product line', c.productLine.name],
    ['Requirement set', c.requirementSet.name],
    ['Revision', `Revision ${c.revision.number} (id ${c.revision.id})`],
    ['Revision SHA-256', c.revision.sha256, HASH],
    ['Approval', approval],
    ['Revision impact', impactSummary(c)],
    ['Candidate', `${c.candidate.name} (id ${c.candidate.id})${c.candidate.notes ? `: ${c.candidate.notes}` : ''}`],
    ['Assessment', `Assessment ${c.assessment.id}, made ${utc(c.assessment.createdAt)} by ${person(c.assessment.createdBy)}`],
    ['Engine version', c.assessment.engineVersion],
  ]);

  layout.section('Verdict');
  const failed = result.checks.filter((k) => k.status === 'fail').length;
  const passed = result.checks.filter((k) => k.status === 'pass').length;
  const dom = result.dominant;
  const domWords = dom === null ? 'no dominant pole' : dom.approximationValid ? 'dominance holds' : 'dominance weak';
  layout.text(
    `${verdict.word}. ${passed} of ${result.checks.length} ${result.checks.length === 1 ? 'check passes' : 'checks pass'}${failed ? `, ${failed} ${failed === 1 ? 'fails' : 'fail'}` : ''} on the exact step response of the whole model. ` +
      `Second-order view: ${domWords}${result.regionPass === null ? '' : result.regionPass ? '; the dominant poles lie in the admissible region' : '; the dominant poles lie outside the admissible region'}.`,
    { size: 10 },
  );

  layout.section('Electronic signature');
  const sigTop = layout.y;
  const sigRows: ([string, string] | [string, string, TextStyle])[] = [
    ['Signed by (printed name)', c.signer.name],
    ['User ID', c.signer.email],
    ['Date and time of signing', utc(c.signedAt)],
    ['Meaning of the signature', `${REPORT_MEANING_LABELS[c.meaning]}. ${REPORT_MEANING_STATEMENTS[c.meaning]}`],
    [
      'How it was signed',
      `The signer re-entered their password at signing. The file carries a digital signature over its bytes (ISO 32000-1 §12.8, detached CMS) made with the certificate "${c.signing.subject}".`,
    ],
    ['Certificate SHA-256', c.signing.certificateSha256, HASH],
  ];
  layout.keyValues(sigRows, 140);
  doc.rect(PAGE.left - 10, sigTop - 2, 2.5, layout.y - sigTop).fill(INK.accent);
  layout.y += 4;

  layout.callout(REPORT_CAUTION_TITLE, REPORT_CAUTION_TEXT, { bar: INK.caution, fill: INK.cautionSoft, title: INK.caution });

  // ---- the model and the plots ---------------------------------------------
  layout.addPage();
  layout.section('Candidate model', 'The closed-loop model as submitted, continuous time.');
  layout.keyValues(designRows(c.candidate.design, result), 120);

  layout.section('s-plane', 'The admissible region (shaded) is where dominant poles meet every limit at once in the second-order view. Poles are drawn as x, zeros as o; the dominant pole or pair is ringed; the dashed line is the dominance threshold.');
  const splane = splanePlot({
    width: S_PLANE_BOX.width,
    height: S_PLANE_BOX.height,
    viewport: c.region.viewport,
    region: c.region,
    poles: result.poles,
    zeros: result.zeros,
    dominantPoles: dom?.poles ?? [],
    dominanceRatio: c.bounds.dominanceRatio,
    fontSize: 7,
  });
  layout.ensure(S_PLANE_BOX.height + 20);
  drawSplane(layout, splane, PAGE.left, layout.y);
  layout.y += S_PLANE_BOX.height + 8;
  for (const b of splane.boundaryPaths) {
    layout.text(`${b.key}   ${b.label}${b.binding ? '' : ' (not an edge of the region in this view)'}`, { size: 8, color: INK.muted }, { gapAfter: 1.5 });
  }
  if (c.region.feasible === false) layout.text('No pole position meets every limit at once: the admissible region is empty.', { size: 8.5, color: INK.fail });
  layout.y += 4;

  // ---- step response, checks and dominance ----------------------------------
  layout.addPage();
  layout.section('Step response', 'The exact unit-step response of the whole model, with the settling band, the overshoot ceiling and the time limits as guides.');
  const req = c.revision.requirements;
  const step = stepPlot({
    width: STEP_BOX.width,
    height: STEP_BOX.height,
    samples: c.step.t.map((t, i) => ({ t, y: c.step.y[i]! })),
    finalValue: result.stable ? result.dcGain : null,
    settlingBandPct: result.metrics?.settlingBandPct ?? req.settlingBandPct ?? 2,
    maxOvershootPct: req.maxOvershootPct ?? null,
    maxPeakTime: req.maxPeakTime ?? null,
    maxSettlingTime: req.maxSettlingTime ?? null,
    maxRiseTime: req.maxRiseTime ?? null,
    fontSize: 7,
  });
  layout.ensure(STEP_BOX.height + 10);
  drawStep(layout, step, PAGE.left, layout.y);
  layout.y += STEP_BOX.height + 8;

  layout.section(
    'Checks',
    `Each limit against the exact value from the step response of the whole model, with the second-order estimate from the dominant poles beside it.${req.marginPct ? ` Limits are tightened by the ${num(req.marginPct)} % margin for the status.` : ''}`,
  );
  const columns: Column[] = [
    { title: 'Limit', width: 150 },
    { title: 'Exact value', width: 76, align: 'right' },
    { title: 'Second-order estimate', width: 84, align: 'right' },
    { title: 'Status', width: 80 },
    { title: 'Margin', width: CONTENT_WIDTH - 390, align: 'right' },
  ];
  const rows: Cell[][] = result.checks.map((k) => {
    const unit = REQUIREMENT_WORDS[k.requirement]?.unit ?? '';
    const limit = limitText(k.requirement, k.limit) + (k.effectiveLimit !== undefined && k.effectiveLimit !== k.limit ? ` (${num(k.effectiveLimit, unit)} with margin)` : '');
    return [
      { text: limit + (k.reason ? `\n${k.reason}` : '') },
      { text: num(k.value, unit) },
      { text: num(k.estimate, unit), color: INK.muted },
      statusCell(k.status),
      { text: k.marginPct === null ? '-' : `${k.marginPct > 0 ? '+' : ''}${num(k.marginPct)} %`, color: k.marginPct !== null && k.marginPct < 0 ? INK.fail : INK.ink },
    ];
  });
  if (rows.length) layout.table(columns, rows);
  else layout.text('The revision sets no limit that gives a check.', { size: 9 });
  layout.text('Margin: how far the exact value stands inside its limit, as a percentage of the limit (negative: outside).', { size: 8, color: INK.muted });

  const m = result.metrics;
  if (m) {
    layout.section('Exact step-response metrics');
    layout.keyValues([
      ['Final value', num(m.finalValue)],
      ['Percent overshoot', num(m.overshootPct, '%')],
      ['Undershoot', num(m.undershootPct, '%')],
      ['Peak time', m.peakTime === null ? 'no overshoot, no peak' : num(m.peakTime, 's')],
      [`Settling time (${num(m.settlingBandPct)} % band)`, num(m.settlingTime, 's')],
      ['Rise time (10-90 %)', num(m.riseTime, 's')],
    ]);
  }

  layout.section('Dominance');
  if (dom) {
    layout.keyValues([
      ['Dominant poles', roots(dom.poles)],
      ['Damping ratio', dom.dampingRatio === null ? 'real pole (first order)' : num(dom.dampingRatio)],
      ['Natural frequency', num(dom.naturalFrequency, 'rad/s')],
      ['Pole ratio', dom.ratio === null ? 'no other pole' : `${num(dom.ratio)} (threshold ${num(c.bounds.dominanceRatio)})`],
      ['Zero ratio', dom.zeroRatio === null ? 'no zero to compare' : num(dom.zeroRatio)],
      ['Second-order view', dom.approximationValid ? 'Dominance holds: the dominant poles stand for the whole model.' : 'Dominance weak: read the estimates with care; the exact values decide the verdict.'],
    ]);
  }
  const notes = [...(dom?.notes ?? []), ...(result.notes ?? [])];
  if (notes.length) {
    layout.text('Notes', { size: 9, weight: 'semibold' }, { gapAfter: 3 });
    for (const n of notes) layout.text(`·  ${n.charAt(0).toUpperCase()}${n.slice(1)}.`.replace(/\.\.$/, '.'), { size: 8.5 }, { gapAfter: 2 });
  }

  // ---- revision diff, audit head, evidence ----------------------------------
  layout.addPage();
  layout.section(
    'Changes against the previously approved revision',
    c.diff.againstRevisionNumber === null
      ? `Revision ${c.revision.number} is the first approved revision of ${c.requirementSet.name}: every limit is new.`
      : `Revision ${c.revision.number} limit by limit against revision ${c.diff.againstRevisionNumber}, the approved revision it replaced.`,
  );
  const diffRows: Cell[][] = c.diff.items.map((d) => {
    const w = REQUIREMENT_WORDS[d.field];
    const changeColor = d.change === 'tightened' ? INK.accent : d.change === 'loosened' ? INK.caution : INK.ink;
    return [
      { text: w?.name ?? d.field },
      { text: d.before === null ? 'not set' : num(d.before, w?.unit ?? '') },
      { text: d.after === null ? 'not set' : num(d.after, w?.unit ?? '') },
      { text: d.change, color: changeColor, weight: d.change === 'same' ? 'regular' : 'medium' },
    ];
  });
  layout.table(
    [
      { title: 'Limit', width: 170 },
      { title: c.diff.againstRevisionNumber === null ? 'Before' : `Revision ${c.diff.againstRevisionNumber}`, width: 105, align: 'right' },
      { title: `Revision ${c.revision.number}`, width: 105, align: 'right' },
      { title: 'Change', width: CONTENT_WIDTH - 380 },
    ],
    diffRows,
  );
  if (c.revision.rationale) layout.keyValues([['Rationale of the revision', c.revision.rationale]], 150);

  layout.section('Record');
  layout.keyValues(
    [
      ['Audit-chain head at signing', c.auditHead.hash, HASH],
      ['Audit event', c.auditHead.id === null ? 'none yet' : `the chain's last event when signing was number ${c.auditHead.id}`],
      ['Evidence attached', `${c.number}-evidence.json: the design, the revision's requirements and the stored result, so the assessment can be recomputed.`],
      ['To verify this file', 'Upload it on the Verify a report page of Polecourt: it checks the signature over the file, that the file is the one Polecourt issued, and recomputes the assessment from the attached evidence.'],
    ],
    150,
  );

  // ---- evidence and footers ---------------------------------------------------
  const evidence = Buffer.from(JSON.stringify(evidenceOf(c), null, 2));
  doc.file(evidence, {
    name: `${c.number}-evidence.json`,
    type: 'application/json',
    description: 'Inputs and outputs of the assessment, to recompute it',
    creationDate: c.signedAt,
    modifiedDate: c.signedAt,
  });

  const range = doc.bufferedPageRange();
  const footer = `${c.number} · revision ${c.revision.number} SHA-256 ${shortHash(c.revision.sha256)} · engine ${c.assessment.engineVersion} · signed ${utc(c.signedAt)}`;
  for (let i = range.start; i < range.start + range.count; i++) {
    doc.switchToPage(i);
    doc.moveTo(PAGE.left, PAGE.footerY - 6).lineTo(PAGE.left + CONTENT_WIDTH, PAGE.footerY - 6).lineWidth(0.4).strokeColor(INK.rule).stroke();
    layout.line(footer, PAGE.left, PAGE.footerY, { size: 7, color: INK.muted });
    layout.line(`page ${i - range.start + 1} of ${range.count}`, PAGE.left + CONTENT_WIDTH, PAGE.footerY, { size: 7, color: INK.muted }, 'right');
  }

  // The signature field sits on the last page, invisible; its value is filled by the signer.
  pdfkitAddPlaceholder({
    pdf: doc,
    pdfBuffer: Buffer.alloc(0),
    reason: `${REPORT_MEANING_LABELS[c.meaning]}: ${REPORT_MEANING_STATEMENTS[c.meaning]}`,
    contactInfo: c.signer.email,
    name: c.signer.name,
    location: 'Polecourt',
    signingTime: c.signedAt,
    signatureLength: 8192,
    appName: 'Polecourt',
  });
  const pdf = await layout.finish();
  return { pdf, evidence, pages: range.count };
}

/** The viewport the s-plane plot uses, so the region can be computed for exactly it. */
export function reportViewport(input: {
  poles: readonly Complex[];
  zeros: readonly Complex[];
  dominantPoles: readonly Complex[];
  dominanceRatio: number;
  minDecayRate: number | null;
  minDampedFrequency: number | null;
  maxNaturalFrequency: number | null;
}) {
  const frame = plotFrame(S_PLANE_BOX.width, S_PLANE_BOX.height);
  return splaneViewport({
    poles: input.poles,
    zeros: input.zeros,
    dominantPoles: input.dominantPoles,
    dominanceRatio: input.dominanceRatio,
    region: { minDecayRate: input.minDecayRate, minDampedFrequency: input.minDampedFrequency, maxNaturalFrequency: input.maxNaturalFrequency },
    width: frame.width,
    height: frame.height,
  });
}
