import { describe, expect, it } from 'vitest';
import { hashPassword, verifyPassword } from '@/server/services/password';

describe('password hash (scrypt)', () => {
  it('stores scheme, cost, salt and key, and verifies the right password only', async () => {
    const hash = await hashPassword('correct horse battery');
    const [scheme, n, r, p, salt, key] = hash.split('$');
    expect([scheme, n, r, p]).toEqual(['scrypt', '16384', '8', '1']);
    expect(Buffer.from(salt, 'base64')).toHaveLength(16);
    expect(Buffer.from(key, 'base64')).toHaveLength(32);
    expect(await verifyPassword('correct horse battery', hash)).toBe(true);
    expect(await verifyPassword('correct horse batterY', hash)).toBe(false);
  });

  it('salts every hash, so equal passwords hash differently', async () => {
    const [a, b] = await Promise.all([hashPassword('same password'), hashPassword('same password')]);
    expect(a).not.toBe(b);
    expect(await verifyPassword('same password', b)).toBe(true);
  });

  it('treats a malformed or foreign hash as no match instead of throwing', async () => {
    for (const stored of [
      '',
      'plain-text',
      'bcrypt$10$abc',
      'scrypt$0$8$1$c2FsdA==$a2V5',
      'scrypt$16384$8$1$c2FsdA==$c2hvcnQ=',
    ]) {
      expect(await verifyPassword('anything', stored)).toBe(false);
    }
  });

  it('derives the key with the cost stored in the hash, not a fixed one', async () => {
    const hash = await hashPassword('older account');
    const cheaper = hash.replace('scrypt$16384$', 'scrypt$1024$');
    expect(await verifyPassword('older account', cheaper)).toBe(false);
    expect(await verifyPassword('older account', hash)).toBe(true);
  });
});
