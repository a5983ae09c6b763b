// Builds the plain-text and HTML bodies of a message from the same blocks, so
// both always say the same thing. Everything put into HTML is escaped here.

export type Block =
  | { kind: 'paragraph'; text: string }
  | { kind: 'action'; label: string; url: string }
  | { kind: 'list'; items: string[] }
  | { kind: 'note'; text: string };

export interface RenderedMail {
  text: string;
  html: string;
}

export const paragraph = (text: string): Block => ({ kind: 'paragraph', text });
export const action = (label: string, url: string): Block => ({ kind: 'action', label, url });
export const list = (items: string[]): Block => ({ kind: 'list', items });
export const note = (text: string): Block => ({ kind: 'note', text });

export function escapeHtml(value: string): string {
  return value.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;').replace(/'/g, '&#39;');
}

// Paper-and-ink, one teal accent; inline styles because mail readers drop <style>.
const INK = '#1e2a33';
const MUTED = '#4d5a65';
const PAPER = '#f7f4ec';
const RAISED = '#fcfaf5';
const RULE = '#d8d1c0';
const ACCENT = '#0e5a58';

function blockText(b: Block): string {
  switch (b.kind) {
    case 'paragraph':
    case 'note':
      return b.text;
    case 'action':
      return `${b.label}:\n${b.url}`;
    case 'list':
      return b.items.map((i) => `- ${i}`).join('\n');
  }
}

function blockHtml(b: Block): string {
  switch (b.kind) {
    case 'paragraph':
      return `<p style="margin:0 0 16px">${escapeHtml(b.text)}</p>`;
    case 'note':
      return `<p style="margin:0 0 16px;font-size:13px;color:${MUTED}">${escapeHtml(b.text)}</p>`;
    case 'action':
      return (
        `<p style="margin:0 0 16px"><a href="${escapeHtml(b.url)}" style="display:inline-block;background:${ACCENT};color:${RAISED};` +
        `text-decoration:none;padding:10px 16px;border-radius:4px;font-weight:600">${escapeHtml(b.label)}</a></p>` +
        `<p style="margin:0 0 16px;font-size:13px;color:${MUTED}">Or paste this address into your browser:<br>` +
        `<span style="word-break:break-all">${escapeHtml(b.url)}</span></p>`
      );
    case 'list':
      return `<ul style="margin:0 0 16px;padding-left:20px">${b.items.map((i) => `<li>${escapeHtml(i)}</li>`).join('')}</ul>`;
  }
}

const SIGNATURE = 'Polecourt';
const FOOTER = 'This message was sent by Polecourt. Replies to it are not read.';

export function renderMail(greeting: string, blocks: Block[]): RenderedMail {
  const text = [greeting, ...blocks.map(blockText), `-- \n${SIGNATURE}`, FOOTER].join('\n\n') + '\n';
  const html =
    `<!doctype html><html><body style="margin:0;padding:24px;background:${PAPER};color:${INK};` +
    `font-family:Inter,Segoe UI,Helvetica,Arial,sans-serif;font-size:15px;line-height:1.5">` +
    `<div style="max-width:560px;margin:0 auto;background:${RAISED};border:1px solid ${RULE};border-radius:6px;padding:24px">` +
    `<p style="margin:0 0 16px;font-weight:600;color:${ACCENT};letter-spacing:0.02em">Polecourt</p>` +
    `<p style="margin:0 0 16px">${escapeHtml(greeting)}</p>` +
    blocks.map(blockHtml).join('') +
    `<p style="margin:24px 0 0;font-size:12px;color:${MUTED};border-top:1px solid ${RULE};padding-top:12px">${escapeHtml(FOOTER)}</p>` +
    `</div></body></html>`;
  return { text, html };
}

/** A UTC time people can read in any time zone: "2025-03-04 17:05 UTC". */
export function formatUtc(date: Date): string {
  return `${date.toISOString().slice(0, 16).replace('T', ' ')} UTC`;
}

export interface Recipient {
  email: string;
  name: string;
}

/** One message per address: the same person listed twice gets one. */
export function uniqueRecipients(recipients: readonly Recipient[]): Recipient[] {
  const seen = new Map<string, Recipient>();
  for (const r of recipients) {
    const key = r.email.trim().toLowerCase();
    if (key && !seen.has(key)) seen.set(key, { email: key, name: r.name });
  }
  return [...seen.values()];
}
