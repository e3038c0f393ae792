import { z } from 'zod';

// Zod 4 probes `new Function` once to decide whether to compile fast parsers. Under the app's
// Content Security Policy (no 'unsafe-eval') the probe is refused, and although zod catches the
// error, the browser reports a CSP violation. Turning the compiler off skips the probe; parsing
// stays correct, a little slower. Import this module first in every browser entry (page, workers).
z.config({ jitless: true });
