// What `zod` resolves to in the browser build (vite.config.ts aliases it): zod itself, with its
// parser compiler turned off before any schema module runs. Code splitting evaluates shared
// chunks before the entry's own first import, so configuring zod from the entry came too late:
// a schema parsed while its chunk loaded made zod probe `new Function`, which the Content
// Security Policy refuses and reports. Importing zod through this module orders it right.
import { z } from 'zod/v4';

z.config({ jitless: true });

export * from 'zod/v4';
