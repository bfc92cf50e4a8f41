import { z } from "zod";

// Zod compiles object parsers with `new Function` when it may. The pages' Content-Security-Policy has no
// 'unsafe-eval' (lib/security/csp.ts), and even zod's guarded probe for it is reported as a violation, so
// every schema module imports this first and zod parses without generated code (same results).
z.config({ jitless: true });
