import { afterEach, describe, expect, it, vi } from 'vitest';
import { appOrigin } from '@/app/lib/app-origin';
import { authSecret } from '@/app/lib/auth-secret';
import { runWithSocketPeer } from '@/app/lib/client-address';
import { inboxForThisRequest, mailFakeUrl } from '@/app/lib/mail-fake-inbox';
import { smtpUrl } from '@/app/lib/mailer';

afterEach(() => {
  vi.unstubAllEnvs();
});

const request = new Request('http://forged.example:8080/api/v1/account/password-reset');

describe('what production refuses to guess', () => {
  it('the session key: NEXTAUTH_SECRET is required, the development key is used only outside production', () => {
    vi.stubEnv('NEXTAUTH_SECRET', '');
    vi.stubEnv('AUTH_SECRET', '');
    vi.stubEnv('NODE_ENV', 'production');
    expect(() => authSecret()).toThrow(/NEXTAUTH_SECRET is not set/);
    vi.stubEnv('NODE_ENV', 'development');
    expect(authSecret()).toMatch(/development-only/);
    vi.stubEnv('NEXTAUTH_SECRET', 'configured-key');
    vi.stubEnv('NODE_ENV', 'production');
    expect(authSecret()).toBe('configured-key');
  });

  it('the mail server: SMTP_URL is required in production, the local fake is the default elsewhere', () => {
    vi.stubEnv('SMTP_URL', '');
    vi.stubEnv('NODE_ENV', 'production');
    expect(() => smtpUrl()).toThrow(/SMTP_URL is not set/);
    vi.stubEnv('NODE_ENV', 'development');
    expect(smtpUrl()).toBe('smtp://127.0.0.1:2525');
  });

  it('the origin of mailed links: never the request Host in production', () => {
    vi.stubEnv('APP_URL', '');
    vi.stubEnv('NEXTAUTH_URL', '');
    vi.stubEnv('NODE_ENV', 'production');
    expect(() => appOrigin(request)).toThrow(/APP_URL is not set/);
    vi.stubEnv('APP_URL', 'https://rimscale.example/some/path');
    expect(appOrigin(request)).toBe('https://rimscale.example');
    vi.stubEnv('APP_URL', '');
    vi.stubEnv('NODE_ENV', 'development');
    expect(appOrigin(request)).toBe('http://forged.example:8080');
  });
});

describe('the development inbox guard', () => {
  it('is open only with MAIL_FAKE_URL set to a loopback address', () => {
    vi.stubEnv('MAIL_FAKE_URL', '');
    expect(mailFakeUrl()).toBeNull();
    vi.stubEnv('MAIL_FAKE_URL', 'http://mail.example:2580');
    expect(mailFakeUrl()).toBeNull();
    vi.stubEnv('MAIL_FAKE_URL', 'not a url');
    expect(mailFakeUrl()).toBeNull();
    vi.stubEnv('MAIL_FAKE_URL', 'http://127.0.0.1:2580');
    expect(mailFakeUrl()?.port).toBe('2580');
    vi.stubEnv('MAIL_FAKE_URL', 'http://localhost:2580');
    expect(mailFakeUrl()?.hostname).toBe('localhost');
  });
});

describe('the development inbox for a request', () => {
  it('opens to loopback socket peers only, and only while the fake takes the mail', () => {
    vi.stubEnv('NODE_ENV', 'production');
    vi.stubEnv('MAIL_FAKE_URL', 'http://127.0.0.1:2580');
    vi.stubEnv('SMTP_URL', 'smtp://127.0.0.1:2525');
    expect(runWithSocketPeer('127.0.0.1', inboxForThisRequest)?.port).toBe('2580');
    expect(runWithSocketPeer('::1', inboxForThisRequest)).not.toBeNull();
    // Anyone else on the shop's network (RFC 5737 documentation addresses stand in).
    expect(runWithSocketPeer('192.0.2.44', inboxForThisRequest)).toBeNull();
    expect(runWithSocketPeer('::ffff:198.51.100.7', inboxForThisRequest)).toBeNull();
    // A production server not started by scripts/server.mjs does not know the peer: closed.
    expect(inboxForThisRequest()).toBeNull();
    // Real mail configured: the fake is not in use, so no inbox even for this machine.
    vi.stubEnv('SMTP_URL', 'smtp://mail.example:587');
    expect(runWithSocketPeer('127.0.0.1', inboxForThisRequest)).toBeNull();
  });
});
