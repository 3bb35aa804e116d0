import 'next-auth';

declare module 'next-auth' {
  interface Session {
    user: { id: string; email: string; name: string; sessionVersion: number };
  }
  interface User {
    sessionVersion?: number;
  }
}

declare module 'next-auth/jwt' {
  interface JWT {
    sv?: number;
  }
}
