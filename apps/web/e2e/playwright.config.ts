import { fileURLToPath } from 'node:url';
import { defineConfig } from '@playwright/test';

const PORT = Number(process.env.E2E_PORT ?? 3199);
export const BASE_URL = `http://127.0.0.1:${PORT}`;
const serve = fileURLToPath(new URL('./serve.sh', import.meta.url));

/**
 * Browser tests on Debian's chromium (never a downloaded browser) against the built server,
 * started on a fresh SQLite file with the demo data loaded.
 */
export default defineConfig({
  testDir: '.',
  testMatch: '*.spec.ts',
  outputDir: './artifacts/results',
  timeout: 60_000,
  expect: { timeout: 10_000 },
  fullyParallel: false,
  workers: 1,
  retries: 0,
  use: {
    baseURL: BASE_URL,
    launchOptions: {
      executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
      args: [
        '--headless',
        '--no-sandbox',
        '--disable-gpu',
        '--disable-quic',
        '--no-first-run',
        '--disable-background-networking',
        '--disable-component-update',
        '--disable-sync',
      ],
    },
    trace: 'retain-on-failure',
    screenshot: 'only-on-failure',
  },
  webServer: {
    command: `bash ${serve} ${PORT}`,
    url: `${BASE_URL}/api/health`,
    reuseExistingServer: false,
    timeout: 60_000,
    stdout: 'ignore',
    stderr: 'pipe',
  },
});
