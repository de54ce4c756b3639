import 'server-only';
import { hash, verify } from '@node-rs/argon2';

// argon2id (the library's default algorithm) with OWASP's minimum: 19 MiB, 2 passes.
const OPTIONS = { memoryCost: 19456, timeCost: 2, parallelism: 1 } as const;

let dummyHash: string | undefined;

export const hashPassword = (password: string) => hash(password, OPTIONS);

export async function verifyPassword(passwordHash: string | null, password: string): Promise<boolean> {
  // Without a stored hash, still spend the time of one verification so unknown e-mails and
  // wrong passwords cannot be told apart by timing.
  const target = passwordHash ?? (dummyHash ??= await hash('no password is set for this account', OPTIONS));
  try {
    const ok = await verify(target, password);
    return ok && passwordHash !== null;
  } catch {
    return false;
  }
}
