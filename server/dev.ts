import { type ChildProcess, spawn } from 'node:child_process';
import { createRequire } from 'node:module';
import { fileURLToPath } from 'node:url';
import { createServer } from 'vite';

// `npm run dev`: the API under `tsx watch` (restarts on server changes) beside Vite's dev server
// (hot module reload for the client), which proxies /api to it. Open the Vite URL.
const root = fileURLToPath(new URL('..', import.meta.url));
const host = process.env.HOST ?? '127.0.0.1';
const clientPort = Number(process.env.DEV_CLIENT_PORT ?? 5173);
const apiPort = Number(process.env.PORT ?? 3000);
const clientUrl = `http://${host}:${clientPort}`;

const tsxCli = createRequire(import.meta.url).resolve('tsx/cli');
const api: ChildProcess = spawn(process.execPath, [tsxCli, 'watch', '--clear-screen=false', 'server/main.ts'], {
  cwd: root,
  stdio: 'inherit',
  env: { ...process.env, HOST: host, PORT: String(apiPort), PUBLIC_URL: process.env.PUBLIC_URL ?? clientUrl },
});

const vite = await createServer({
  root,
  server: { host, port: clientPort, strictPort: true, proxy: { '/api': `http://${host}:${apiPort}` } },
});
await vite.listen();
vite.printUrls();

let stopping = false;
async function stop() {
  if (stopping) return;
  stopping = true;
  api.kill('SIGTERM');
  await vite.close();
  process.exit(0);
}
api.on('exit', (code) => {
  if (!stopping) {
    console.error(`API process ended (${code}); stopping`);
    void stop();
  }
});
process.on('SIGINT', () => void stop());
process.on('SIGTERM', () => void stop());
