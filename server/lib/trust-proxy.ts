import net from 'node:net';

/**
 * Express's 'trust proxy' setting, read from TRUST_PROXY. Only a request that arrives from a
 * trusted hop may tell us the client's address (X-Forwarded-For) and scheme (X-Forwarded-Proto);
 * with nothing set those headers are ignored, so a visitor cannot pose as another address.
 *   unset / "false"      trust no proxy (the app faces the clients itself)
 *   "true"               trust every hop (only when nothing but the proxy can reach the app)
 *   "1", "2", …          trust that many hops in front of the app
 *   "loopback", "10.0.0.0/8", "192.168.1.5" (comma-separated)  trust those addresses, subnets or
 *                        Express's names loopback / linklocal / uniquelocal
 */
export type TrustProxy = boolean | number | string[];

const NAMES = new Set(['loopback', 'linklocal', 'uniquelocal']);

function isAddressOrSubnet(item: string) {
  const [addr, bits, extra] = item.split('/');
  if (extra !== undefined || !net.isIP(addr)) return false;
  if (bits === undefined) return true;
  const max = net.isIPv4(addr) ? 32 : 128;
  return /^\d{1,3}$/.test(bits) && Number(bits) <= max;
}

export function parseTrustProxy(raw: string | undefined): TrustProxy | Error {
  const value = raw?.trim() ?? '';
  if (value === '' || value === 'false') return false;
  if (value === 'true') return true;
  if (/^\d+$/.test(value)) return Number(value);
  const items = value.split(',').map((s) => s.trim()).filter(Boolean);
  const bad = items.filter((i) => !NAMES.has(i) && !isAddressOrSubnet(i));
  if (bad.length) {
    return new Error(`TRUST_PROXY: "${bad.join(', ')}" is not an address, a subnet, a hop count, true/false or loopback/linklocal/uniquelocal`);
  }
  return items;
}
