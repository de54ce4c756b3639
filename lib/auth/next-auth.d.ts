import 'next-auth';
import 'next-auth/jwt';

declare module 'next-auth' {
  interface Session {
    user: { id: string; siteId: string; role: 'technician' | 'supervisor' | 'admin'; sv: number; name?: string | null; email?: string | null };
  }
}
declare module 'next-auth/jwt' {
  interface JWT {
    uid?: string;
    siteId?: string;
    role?: string;
    sv?: number;
  }
}
