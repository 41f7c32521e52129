import { describe, expect, it } from 'vitest';
import { clientAddress, readTrustedProxies } from '@/lib/client-address';

/**
 * The client's address behind reverse proxies. Common practice (the de-facto X-Forwarded-For convention, RFC 7239 §5.2
 * for its Forwarded successor): each proxy appends the address it received the request from, so only entries added by
 * proxies you run can be trusted, counted from the right; whatever is left of them the client wrote.
 */
describe('clientAddress', () => {
  it('takes the entry one proxy appended, not the one the client wrote in front of it', () => {
    // The client sends "X-Forwarded-For: 192.0.2.66" hoping to pass as another; the proxy appends what it saw.
    expect(clientAddress('192.0.2.66, 198.51.100.7', null, 1)).toBe('198.51.100.7');
  });

  it('counts several trusted proxies from the right', () => {
    // client 203.0.113.9 → first proxy (appends 203.0.113.9) → second proxy (appends 10.0.0.2, the first proxy)
    expect(clientAddress('192.0.2.66, 203.0.113.9, 10.0.0.2', null, 2)).toBe('203.0.113.9');
    expect(clientAddress('203.0.113.9, 10.0.0.2', null, 2)).toBe('203.0.113.9');
  });

  it('takes the leftmost when there are fewer entries than proxies, trims spaces, skips empty entries', () => {
    expect(clientAddress(' 2001:db8::5 ', null, 3)).toBe('2001:db8::5');
    expect(clientAddress('2001:db8::5,, ', null, 1)).toBe('2001:db8::5');
  });

  it('falls back to X-Real-IP, then to "unknown"', () => {
    expect(clientAddress(null, ' 198.51.100.20 ', 1)).toBe('198.51.100.20');
    expect(clientAddress('', undefined, 1)).toBe('unknown');
  });
});

describe('SEAMLINE_TRUSTED_PROXIES', () => {
  it('defaults to one proxy and reads a whole number 1–10', () => {
    expect(readTrustedProxies({})).toBe(1);
    expect(readTrustedProxies({ SEAMLINE_TRUSTED_PROXIES: ' ' })).toBe(1);
    expect(readTrustedProxies({ SEAMLINE_TRUSTED_PROXIES: '2' })).toBe(2);
  });

  it('refuses anything else, naming the variable', () => {
    for (const bad of ['0', '11', '1.5', 'two', '-1']) expect(() => readTrustedProxies({ SEAMLINE_TRUSTED_PROXIES: bad })).toThrow(/SEAMLINE_TRUSTED_PROXIES must be a whole number of proxies, 1–10, got/);
  });
});
