// Bundles the command-line tool and its batch worker into one file each
// (zod included), over the per-module files tsc wrote to dist/. Node then
// loads two files instead of about 130 ES modules, which is most of
// `polecourt`'s start-up time; the library entry (dist/index.js) stays as tsc
// wrote it.
import { build } from 'esbuild';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

const root = join(dirname(fileURLToPath(import.meta.url)), '..');

await build({
  entryPoints: { cli: join(root, 'src', 'cli.ts'), 'batch-worker': join(root, 'src', 'batch-worker.ts') },
  outdir: join(root, 'dist'),
  bundle: true,
  platform: 'node',
  format: 'esm',
  target: 'node20',
  // whitespace and syntax only: names stay readable in an internal error's stack
  minifyWhitespace: true,
  minifySyntax: true,
  legalComments: 'none',
  logLevel: 'warning',
});
