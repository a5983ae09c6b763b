#!/usr/bin/env node
// polecourt: the engine on the command line. JSON only on stdout; messages on
// stderr. Usage text goes to stdout only when asked for with --help (that is
// the output the caller wanted); a usage mistake prints an error object on
// stdout, the message on stderr, and exits 2.
import { createReadStream, fstatSync, openSync, readFileSync } from 'node:fs';
import { availableParallelism } from 'node:os';
import { StringDecoder } from 'node:string_decoder';
import { Worker } from 'node:worker_threads';

import { assessJsonBlock, type BlockResult } from './assess-json-block.js';
import { evaluate } from './evaluate.js';
import { parseRequirements, type ResolvedRequirements } from './parse-requirements.js';
import { regionBounds } from './region-bounds.js';
import { SpecInputError } from './spec-input-error.js';
import { ENGINE_VERSION } from './version.js';

const USAGE = `polecourt ${ENGINE_VERSION}: transient-response requirements and closed-loop assessments

Usage:
  polecourt region   --requirements FILE
  polecourt evaluate --design FILE [--requirements FILE]
  polecourt batch    --designs FILE.jsonl [--requirements FILE]
  polecourt --help | --version

FILE may be - for standard input (for one of the files only). Output is JSON
on standard output: region prints the admissible region's bounds, evaluate one
assessment, batch one assessment (or one {"error": ...} object) per input
line, in order. Messages go to standard error; this text goes to standard
output only when asked for with --help.

Exit status:
  0  evaluate: compliant, or no requirements given; batch: every line
     compliant (or no requirements and no bad line); region: bounds printed
  1  evaluate: noncompliant; batch: at least one line noncompliant or bad;
     any command: standard output was closed before all was written (as by
     | head): the command stops there, with no message
  2  bad input or usage: {"error": {"code", "message", "path"}} on stdout
  3  an internal error of the engine (please report it)
`;

class UsageError extends Error {
  constructor(
    readonly code: string,
    message: string,
  ) {
    super(message);
  }
}

const COMMAND_FLAGS: Record<string, { required: string[]; optional: string[] }> = {
  region: { required: ['requirements'], optional: [] },
  evaluate: { required: ['design'], optional: ['requirements'] },
  batch: { required: ['designs'], optional: ['requirements'] },
};

function parseArgs(argv: string[]): { command: string; flags: Map<string, string> } | 'help' | 'version' {
  if (argv.includes('--help') || argv.includes('-h') || argv[0] === 'help') return 'help';
  if (argv[0] === '--version') return 'version';
  const command = argv[0];
  if (command === undefined) throw new UsageError('missing_command', 'Give a command: region, evaluate or batch (see polecourt --help).');
  const spec = COMMAND_FLAGS[command];
  if (spec === undefined) throw new UsageError('unknown_command', `Unknown command "${command}"; the commands are region, evaluate and batch.`);
  const flags = new Map<string, string>();
  for (let i = 1; i < argv.length; i++) {
    const arg = argv[i] as string;
    if (!arg.startsWith('--')) throw new UsageError('unexpected_argument', `Unexpected argument "${arg}"; every file is given with a flag.`);
    const eq = arg.indexOf('=');
    const name = eq >= 0 ? arg.slice(2, eq) : arg.slice(2);
    if (![...spec.required, ...spec.optional].includes(name)) {
      throw new UsageError('unknown_flag', `Unknown flag --${name} for ${command}; it takes ${[...spec.required, ...spec.optional].map((f) => `--${f}`).join(', ')}.`);
    }
    let value: string | undefined;
    if (eq >= 0) value = arg.slice(eq + 1);
    else {
      value = argv[i + 1];
      i++;
    }
    if (value === undefined || value === '' || (value.startsWith('--') && value !== '-')) {
      throw new UsageError('missing_value', `--${name} needs a file name (or - for standard input).`);
    }
    if (flags.has(name)) throw new UsageError('duplicate_flag', `--${name} is given twice.`);
    flags.set(name, value);
  }
  for (const name of spec.required) {
    if (!flags.has(name)) throw new UsageError('missing_flag', `${command} needs --${name} FILE.`);
  }
  if ([...flags.values()].filter((v) => v === '-').length > 1) {
    throw new UsageError('stdin_twice', 'Only one file can come from standard input (-).');
  }
  return { command, flags };
}

function readText(file: string, what: string): string {
  try {
    return readFileSync(file === '-' ? 0 : file, 'utf8').replace(/^\uFEFF/, '');
  } catch (e) {
    throw new UsageError('file_unreadable', `Cannot read the ${what} file ${file}: ${(e as Error).message}`);
  }
}

function readJson(file: string, what: string): unknown {
  const text = readText(file, what);
  try {
    return JSON.parse(text);
  } catch (e) {
    throw new UsageError('invalid_json', `The ${what} file ${file} is not valid JSON: ${(e as Error).message}`);
  }
}

function errorObject(e: unknown): { code: string; message: string; path?: string } {
  if (e instanceof SpecInputError) return { code: e.code, message: e.message, path: e.path };
  if (e instanceof UsageError) return { code: e.code, message: e.message };
  return { code: 'internal_error', message: `Internal error: ${e instanceof Error ? e.message : String(e)}` };
}

function write(text: string): Promise<void> {
  return new Promise((resolve) => {
    if (process.stdout.write(text)) resolve();
    else process.stdout.once('drain', () => resolve());
  });
}

// Streams the designs chunk by chunk (not line by line through readline, whose
// per-line promises cost more than the assessments) and cuts them into blocks
// of lines. This thread assesses blocks too: a block goes to a worker thread
// (one per further core) that has fewer than three blocks in hand, otherwise
// this thread assesses it at once. So the work starts before any worker is up
// (a worker takes 100 to 200 ms to start on a small machine), and the workers
// need not be kept busy by a thread that is itself waiting. Blocks are sent
// before a worker is up (they wait in its message queue): a worker that had to
// announce itself first sat idle until this thread finished the block in hand,
// 150 to 250 ms of a 10,000-design batch here.
// Output is written in input order with a bounded number of blocks held, so
// memory stays bounded.
const BLOCK_LINES = 250;
const BLOCKS_PER_WORKER = 3;
/** Files shorter than this are assessed on the main thread alone (standard input, of unknown length, may use workers). */
const WORKERS_FROM_BYTES = 3 << 20;

interface Held {
  result: BlockResult | null;
  wait: Promise<BlockResult>;
}

interface PoolWorker {
  worker: Worker;
  failed: boolean;
  /** Blocks sent and not yet answered: id -> the block, kept to assess it here if the worker fails. */
  blocks: Map<number, { lines: string[]; first: number; done: (r: BlockResult) => void }>;
}

class BlockPool {
  private workers: PoolWorker[] = [];
  private seq = 0;

  constructor(
    size: number,
    private readonly req: ResolvedRequirements | null,
  ) {
    for (let i = 0; i < size; i++) {
      // A young generation allowed to grow to 96 MB lets a worker
      // collect garbage less often while a block's output strings are alive:
      // about 5 % off a 10,000-design batch here, no change in peak memory.
      const worker = new Worker(new URL('./batch-worker.js', import.meta.url), {
        workerData: { req },
        resourceLimits: { maxYoungGenerationSizeMb: 96 },
      });
      const pw: PoolWorker = { worker, failed: false, blocks: new Map() };
      worker.on('message', (m: BlockResult & { id: number }) => {
        const block = pw.blocks.get(m.id);
        pw.blocks.delete(m.id);
        block?.done({ text: m.text, allGood: m.allGood, internalErrors: m.internalErrors });
      });
      // A worker that fails or stops loses nothing: its blocks are assessed here instead.
      const takeBack = (why: string): void => {
        pw.failed = true;
        if (pw.blocks.size === 0) return;
        process.stderr.write(`polecourt: a worker thread ${why}; its blocks are assessed on the main thread\n`);
        const blocks = [...pw.blocks.values()];
        pw.blocks.clear();
        for (const block of blocks) block.done(assessJsonBlock(block.lines, block.first, this.req));
      };
      worker.on('error', (e) => takeBack(`failed (${e.message})`));
      worker.on('exit', (code) => takeBack(`stopped (exit code ${code})`));
      this.workers.push(pw);
    }
  }

  /** Sends the block to a worker that can take it now, or returns null. */
  offer(lines: string[], first: number): Promise<BlockResult> | null {
    let best: PoolWorker | null = null;
    for (const pw of this.workers) {
      if (pw.failed || pw.blocks.size >= BLOCKS_PER_WORKER) continue;
      if (!best || pw.blocks.size < best.blocks.size) best = pw;
    }
    if (!best) return null;
    const id = this.seq++;
    const pw = best;
    return new Promise((done) => {
      pw.blocks.set(id, { lines, first, done });
      pw.worker.postMessage({ id, lines, first });
    });
  }

  async close(): Promise<void> {
    await Promise.all(this.workers.map((pw) => pw.worker.terminate()));
  }
}

/** Lets events that arrived meanwhile (a worker's answer) be handled. */
const yieldToEvents = (): Promise<void> => new Promise((resolve) => setImmediate(resolve));

async function runBatch(file: string, req: ResolvedRequirements | null): Promise<number> {
  let stream: NodeJS.ReadableStream;
  let threads = Math.max(1, Math.min(availableParallelism(), 8));
  if (file === '-') stream = process.stdin;
  else {
    let fd: number;
    try {
      fd = openSync(file, 'r');
    } catch (e) {
      throw new UsageError('file_unreadable', `Cannot read the designs file ${file}: ${(e as Error).message}`);
    }
    stream = createReadStream('', { fd, highWaterMark: 1 << 20 });
    // A worker pays for itself only on a long file: it takes 100 to 200 ms to
    // start and then warms up its own compiled code. Here 2,000 to 6,000
    // sixth-order designs ran 0.03 to 0.1 s faster on this thread alone, and
    // 10,000 (3.5 MB) 0.03 s faster with a worker.
    if (fstatSync(fd).size < WORKERS_FROM_BYTES) threads = 1;
  }
  const decoder = new StringDecoder('utf8');
  const maxHeld = 8 * threads;
  let pool: BlockPool | null = null;
  let allGood = true;
  let rest = '';
  let block: string[] = [];
  let nextLine = 1;
  const held: Held[] = [];

  const emit = async (r: BlockResult): Promise<void> => {
    if (!r.allGood) allGood = false;
    for (const m of r.internalErrors) process.stderr.write(`polecourt: ${m}\n`);
    if (r.text) await write(r.text);
  };
  const emitReady = async (): Promise<void> => {
    while (held.length > 0 && held[0]?.result) await emit((held.shift() as Held).result as BlockResult);
  };
  const emitOldest = async (): Promise<void> => {
    const h = held.shift() as Held;
    await emit(h.result ?? (await h.wait));
  };
  const dispatch = async (final: boolean): Promise<void> => {
    const lines = block;
    const first = nextLine;
    block = [];
    nextLine += lines.length;
    // A single short input stays on this thread: no worker start-up to pay.
    if (!pool && !final && threads > 1) pool = new BlockPool(threads - 1, req);
    const sent = pool?.offer(lines, first) ?? null;
    if (sent) {
      const h: Held = { result: null, wait: sent };
      // a worker's block always resolves (a failed worker's blocks are assessed here)
      void sent.then((r) => {
        h.result = r;
      });
      held.push(h);
    } else {
      const result = assessJsonBlock(lines, first, req);
      held.push({ result, wait: Promise.resolve(result) });
      if (pool) await yieldToEvents();
    }
    await emitReady();
    if (held.length >= maxHeld) await emitOldest();
  };
  const take = async (text: string, final: boolean): Promise<void> => {
    const lines = (rest + text).split('\n');
    rest = final ? '' : (lines.pop() as string);
    if (final && lines[lines.length - 1] === '') lines.pop(); // the newline that ends the file
    for (const line of lines) {
      block.push(line);
      if (block.length >= BLOCK_LINES) await dispatch(false);
    }
  };
  try {
    for await (const chunk of stream) {
      await take(typeof chunk === 'string' ? chunk : decoder.write(chunk as Buffer), false);
    }
    await take(decoder.end(), true);
    if (block.length > 0) await dispatch(true);
    while (held.length > 0) await emitOldest();
  } finally {
    await (pool as BlockPool | null)?.close();
  }
  return allGood ? 0 : 1;
}

async function main(argv: string[]): Promise<number> {
  let parsed: ReturnType<typeof parseArgs>;
  try {
    parsed = parseArgs(argv);
    if (parsed === 'help') {
      await write(USAGE);
      return 0;
    }
    if (parsed === 'version') {
      await write(JSON.stringify({ engineVersion: ENGINE_VERSION }) + '\n');
      return 0;
    }
    const { command, flags } = parsed;
    const reqFile = flags.get('requirements');
    if (command === 'region') {
      const req = parseRequirements(readJson(reqFile as string, 'requirements'));
      await write(JSON.stringify(regionBounds(req), null, 2) + '\n');
      return 0;
    }
    if (command === 'evaluate') {
      const design = readJson(flags.get('design') as string, 'design');
      const requirements = reqFile === undefined ? undefined : readJson(reqFile, 'requirements');
      const a = evaluate(design, requirements);
      await write(JSON.stringify(a, null, 2) + '\n');
      return a.verdict === 'noncompliant' ? 1 : 0;
    }
    const req = reqFile === undefined ? null : parseRequirements(readJson(reqFile, 'requirements'));
    return await runBatch(flags.get('designs') as string, req);
  } catch (e) {
    const err = errorObject(e);
    await write(JSON.stringify({ error: err }) + '\n');
    process.stderr.write(`polecourt: ${err.message}\n`);
    if (e instanceof UsageError && e.code !== 'file_unreadable' && e.code !== 'invalid_json') {
      process.stderr.write('Run polecourt --help for usage.\n');
    }
    return err.code === 'internal_error' ? 3 : 2;
  }
}

// A reader that stops early (\`polecourt batch ... | head\`) closes the pipe:
// stop at once and quietly rather than die on the unhandled EPIPE, and not
// with 0, since not every line reached the reader.
process.stdout.on('error', (e: NodeJS.ErrnoException) => {
  if (e.code === 'EPIPE') process.exit(1);
  process.stderr.write(`polecourt: cannot write the output: ${e.message}\n`);
  process.exit(3);
});

main(process.argv.slice(2)).then(
  (code) => {
    process.exitCode = code;
  },
  (e: unknown) => {
    process.stderr.write(`polecourt: ${e instanceof Error ? e.message : String(e)}\n`);
    process.exitCode = 3;
  },
);
