import { isIPv6 } from 'node:net';

/** Expands an IPv6 address to its eight groups, so the first four can be compared. */
function ipv6Groups(address: string): string[] {
  const [head, tail] = address.split('::');
  const left = head ? head.split(':') : [];
  const right = tail !== undefined && tail !== '' ? tail.split(':') : [];
  const missing = tail === undefined ? 0 : 8 - left.length - right.length;
  return [...left, ...Array<string>(missing).fill('0'), ...right].map((g) => g.toLowerCase().replace(/^0+(?=.)/, ''));
}

/**
 * Whom an address-wide limit counts against. One IPv6 subscriber is usually handed a whole /64, so counting single
 * addresses there would let one person step around the limit; an IPv4 address mapped into IPv6 is the IPv4 address.
 */
export function addressKey(ip: string | undefined): string {
  if (!ip) return 'unknown';
  const mapped = ip.match(/^::ffff:(\d+\.\d+\.\d+\.\d+)$/i);
  if (mapped) return mapped[1];
  if (!isIPv6(ip)) return ip;
  return `${ipv6Groups(ip.split('%')[0]).slice(0, 4).join(':')}::/64`;
}
