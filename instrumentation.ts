/**
 * Runs once when the server starts: refuse to serve with an unsafe auth secret (lib/auth-secret.ts)
 * rather than fail on the first sign-in, or worse, sign tokens anyone can forge.
 */
export async function register() {
  if (process.env.NEXT_RUNTIME !== 'nodejs') return;
  const { authSecret } = await import('./lib/env');
  try {
    authSecret();
  } catch (error) {
    console.error(`[leeway] refusing to start: ${(error as Error).message}`);
    process.exit(1);
  }
}
