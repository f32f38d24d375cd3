/** Where the end-to-end tests run: their own app server, database and mail sink. */
export const E2E_PORT = Number(process.env.E2E_PORT ?? 3100);
export const BASE_URL = `http://127.0.0.1:${E2E_PORT}`;
export const E2E_MAIL_PORT = Number(process.env.E2E_MAIL_PORT ?? 2626);
export const E2E_MAIL_DIR = '.data/test-mail';
export const DEMO_PASSWORD = 'leeway-demo-2026';
