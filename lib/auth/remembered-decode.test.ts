import { encode } from 'next-auth/jwt';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { rememberedDecode } from './remembered-decode';

const SECRET = 'a-test-secret-of-reasonable-length-0123456789';

describe('rememberedDecode (session cookie decode, remembered per token)', () => {
  afterEach(() => vi.useRealTimers());

  it('returns the claims next-auth wrote, the first time and from memory', async () => {
    const token = await encode({ token: { uid: 'u-1', sv: 2 }, secret: SECRET, maxAge: 600 });
    const first = await rememberedDecode({ token, secret: SECRET });
    const again = await rememberedDecode({ token, secret: SECRET });
    expect(first?.uid).toBe('u-1');
    expect(again?.sv).toBe(2);
  });

  it('does not answer from memory for another secret or a changed token', async () => {
    const token = await encode({ token: { uid: 'u-2' }, secret: SECRET, maxAge: 600 });
    expect((await rememberedDecode({ token, secret: SECRET }))?.uid).toBe('u-2');
    await expect(rememberedDecode({ token, secret: `${SECRET}-rotated` })).rejects.toThrow();
    const tampered = token.slice(0, -4) + (token.endsWith('AAAA') ? 'BBBB' : 'AAAA');
    await expect(rememberedDecode({ token: tampered, secret: SECRET })).rejects.toThrow();
  });

  it('refuses a remembered token once it has expired (next-auth’s 15 s tolerance)', async () => {
    vi.useFakeTimers({ toFake: ['Date'] });
    vi.setSystemTime(new Date('2026-06-01T08:00:00Z'));
    const token = await encode({ token: { uid: 'u-3' }, secret: SECRET, maxAge: 60 });
    expect((await rememberedDecode({ token, secret: SECRET }))?.uid).toBe('u-3');
    vi.setSystemTime(new Date('2026-06-01T08:01:10Z')); // 70 s: expired, within the tolerance
    expect((await rememberedDecode({ token, secret: SECRET }))?.uid).toBe('u-3');
    vi.setSystemTime(new Date('2026-06-01T08:01:20Z')); // 80 s: past expiry + 15 s
    expect(await rememberedDecode({ token, secret: SECRET })).toBeNull();
  });
});
