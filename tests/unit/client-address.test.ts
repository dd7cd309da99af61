import { describe, expect, it } from 'vitest';
import { addressKey } from '../../server/security/client-address';

describe('the address a limit counts against', () => {
  it('is the IPv4 address itself, also when mapped into IPv6', () => {
    expect(addressKey('203.0.113.7')).toBe('203.0.113.7');
    expect(addressKey('::ffff:203.0.113.7')).toBe('203.0.113.7');
  });

  it('is the /64 for IPv6, however the address is written', () => {
    expect(addressKey('2001:db8:12:34:aaaa::1')).toBe('2001:db8:12:34::/64');
    expect(addressKey('2001:0db8:0012:0034:ffff:1:2:3')).toBe('2001:db8:12:34::/64');
    expect(addressKey('2001:db8::1')).toBe('2001:db8:0:0::/64');
    expect(addressKey('::1')).toBe('0:0:0:0::/64');
  });

  it('is one shared key when the address is unknown', () => {
    expect(addressKey(undefined)).toBe('unknown');
  });
});
