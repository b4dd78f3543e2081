import os from 'node:os';

export type ShopAddress = {
  /** The address the QR code opens (PUBLIC_URL). */
  url: string;
  /** False when the address names this machine only (localhost, 127.x): a phone cannot open it. */
  phonesCanReach: boolean;
  /** This machine's own network addresses, as PUBLIC_URL candidates when phonesCanReach is false. */
  suggestions: string[];
};

const LOOPBACK = /^(localhost|127\.\d+\.\d+\.\d+|\[::1\])$/i;

type Interfaces = ReturnType<typeof os.networkInterfaces>;

/** What the yard desk shows under "Open the shop on a phone". */
export function shopAddress(publicUrl: string, interfaces: Interfaces = os.networkInterfaces()): ShopAddress {
  const url = new URL(publicUrl);
  const phonesCanReach = !LOOPBACK.test(url.hostname);
  const port = url.port || (url.protocol === 'https:' ? '443' : '80');
  const suggestions = phonesCanReach ? [] : Object.values(interfaces).flat()
    .filter((i): i is os.NetworkInterfaceInfo => !!i && i.family === 'IPv4' && !i.internal)
    .map((i) => `${url.protocol}//${i.address}:${port}`);
  return { url: publicUrl, phonesCanReach, suggestions };
}
