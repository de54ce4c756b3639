import { describe, expect, it } from 'vitest';
import { photoKeys } from './photo-keys';

describe('photoKeys', () => {
  it('puts both objects under the site prefix, the thumbnail always as JPEG', () => {
    const keys = photoKeys('0190a1b2-0000-7000-8000-000000000001', '0190A1B2-1111-7000-8000-00000000000A', 'image/png');
    expect(keys.original).toBe('sites/0190a1b2-0000-7000-8000-000000000001/photos/0190a1b2-1111-7000-8000-00000000000a/photo.png');
    expect(keys.thumbnail).toBe('sites/0190a1b2-0000-7000-8000-000000000001/photos/0190a1b2-1111-7000-8000-00000000000a/thumb.jpg');
  });

  it('refuses ids that could escape the prefix', () => {
    expect(() => photoKeys('../other', '0190a1b2-1111-7000-8000-00000000000a', 'image/jpeg')).toThrow(/unsafe site id/);
    expect(() => photoKeys('site-1', '../../x', 'image/jpeg')).toThrow(/UUID/);
  });
});
