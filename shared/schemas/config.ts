import { z } from 'zod';
import { Role } from './workspace.ts';

/** A demo account shown on the sign-in page in demo mode. */
export const DemoUser = z.object({ email: z.string(), password: z.string(), role: Role, name: z.string() });
export type DemoUser = z.infer<typeof DemoUser>;

/** GET /api/config — what the client needs before anyone signs in. */
export const AppConfig = z.object({
  demoMode: z.boolean(),
  demoUsers: z.array(DemoUser),
  signUpOpen: z.boolean(),
  /** The server has a queue for the team's workers (REDIS_URL), so studies can run there. */
  teamWorkers: z.boolean(),
});
export type AppConfig = z.infer<typeof AppConfig>;
