import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type os from 'node:os';
import { shopAddress } from '../../../server/modules/shop-address/shop-address';
import { createTestApp, type TestApp } from '../../helpers/test-app';

const nic = (address: string, internal = false, family: 'IPv4' | 'IPv6' = 'IPv4') =>
  ({ address, internal, family, netmask: '255.255.255.0', mac: '00:00:00:00:00:00', cidr: null }) as os.NetworkInterfaceInfo;
const machine = { lo: [nic('127.0.0.1', true)], eth0: [nic('192.168.40.12'), nic('fe80::1', false, 'IPv6')], wlan0: [nic('10.20.0.7')] };

describe('the shop address on the yard desk', () => {
  it('offers a yard-network address to phones as it is', () => {
    expect(shopAddress('http://192.168.40.12:3000', machine)).toEqual({ url: 'http://192.168.40.12:3000', phonesCanReach: true, suggestions: [] });
  });

  it('says a localhost address cannot reach a phone and suggests this machine\'s network addresses on the same port', () => {
    expect(shopAddress('http://localhost:3000', machine)).toEqual({
      url: 'http://localhost:3000', phonesCanReach: false,
      suggestions: ['http://192.168.40.12:3000', 'http://10.20.0.7:3000'],
    });
    expect(shopAddress('http://127.0.0.1:4100', machine).phonesCanReach).toBe(false);
  });

  describe('GET /api/yard/shop-address', () => {
    let t: TestApp;
    beforeAll(async () => { t = await createTestApp({ publicUrl: 'http://192.168.40.12:3000' }); });
    afterAll(() => t.close());

    it('gives staff the public address the QR code opens', async () => {
      const seller = await t.signedInAs('seller');
      const res = await seller.agent.get('/api/yard/shop-address');
      expect(res.status).toBe(200);
      expect(res.body).toMatchObject({ url: 'http://192.168.40.12:3000', phonesCanReach: true });
    });

    it('is not for buyers', async () => {
      const buyer = await t.signedInAs('buyer');
      expect((await buyer.agent.get('/api/yard/shop-address')).status).toBe(403);
    });
  });
});
