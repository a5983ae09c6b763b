import { z } from 'zod';

// The API's Content-Security-Policy has no 'unsafe-eval'. zod 4 probes for
// eval with `new Function` to compile faster parsers; under the CSP that probe
// is reported as a violation on every page. jitless skips the probe.
z.config({ jitless: true });
