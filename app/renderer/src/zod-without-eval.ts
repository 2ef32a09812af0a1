/**
 * Must be the first import of every renderer entry: zod 4 probes `new Function('')` to decide
 * whether to compile fast parsers, and under the app's CSP (script-src 'self', no 'unsafe-eval')
 * that probe is blocked and reported as a securitypolicyviolation even though zod catches it.
 * jitless mode skips the probe and the compiled parsers; zod then interprets every schema.
 */
import { z } from 'zod';

z.config({ jitless: true });
