import { defineConfig } from '@playwright/test';

const port = Number(process.env['HOOPLINE_E2E_PORT'] ?? 8090);
const baseURL = `http://127.0.0.1:${port}`;

/**
 * Browser journeys in Debian's Chromium (/usr/bin/chromium; never a
 * downloaded browser) against the real API and PostgreSQL. The web server is
 * the built web app served by the API on its own test database.
 */
export default defineConfig({
  testDir: './tests',
  outputDir: './test-results',
  forbidOnly: true,
  retries: process.env['CI'] ? 1 : 0,
  workers: 1,
  fullyParallel: false,
  // A journey runs axe and takes screenshots on several screens: give it room on a slow machine.
  timeout: 120_000,
  expect: { timeout: 10_000 },
  reporter: [['list'], ['html', { open: 'never', outputFolder: './playwright-report' }]],
  use: {
    baseURL,
    trace: 'on-first-retry',
    screenshot: 'only-on-failure',
    launchOptions: {
      executablePath: process.env['HOOPLINE_CHROMIUM'] ?? '/usr/bin/chromium',
      args: [
        '--no-sandbox',
        '--disable-gpu',
        '--disable-background-networking',
        '--disable-component-update',
        '--disable-sync',
        '--no-first-run',
        '--disable-quic',
      ],
    },
  },
  webServer: {
    command: `bash ../scripts/e2e-server.sh ${port}`,
    url: `${baseURL}/api/health`,
    reuseExistingServer: false,
    timeout: 120_000,
    stdout: 'ignore',
    stderr: 'pipe',
  },
});
