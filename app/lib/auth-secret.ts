import 'server-only';

// Used only outside production (next dev, unit tests); production must set NEXTAUTH_SECRET.
const DEVELOPMENT_SECRET = 'rimscale-development-only-secret-never-use-in-production';

/**
 * The key that signs session JWTs: NEXTAUTH_SECRET (or AUTH_SECRET). scripts/demo.sh and
 * scripts/test-e2e.sh generate one per run; `next dev` and tests fall back to a fixed
 * development key; a production server without one refuses to sign anyone in.
 */
export function authSecret(): string {
  const configured = process.env.NEXTAUTH_SECRET || process.env.AUTH_SECRET;
  if (configured) return configured;
  if (process.env.NODE_ENV === 'production') {
    throw new Error('NEXTAUTH_SECRET is not set: production needs it (e.g. `openssl rand -base64 32`)');
  }
  return DEVELOPMENT_SECRET;
}
