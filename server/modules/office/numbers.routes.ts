import { Router } from 'express';
import type { Db } from '../../db/client';
import { requireRole } from '../../lib/session';
import type { MillNumbers, SalesMoney } from '../../../shared/office';
import { daysMilledToSold, refundsByMonthAndSpecies, salesByMonthAndSpecies, slabCountsByStatus } from './numbers.repo';
import { listYardSlabs } from '../slabs/yard-inventory.service';

const round2 = (n: number) => Math.round(n * 100) / 100;

function money(wood: number, services: number, tax: number, rWood: number, rServices: number, rTax: number): SalesMoney {
  return {
    woodCents: wood, servicesCents: services, taxCents: tax,
    refundedWoodCents: rWood, refundedServicesCents: rServices, refundedTaxCents: rTax,
    revenueCents: wood + services - rWood - rServices, netTaxCents: tax - rTax,
  };
}

/** The mill's numbers: sums come from the database; here they are only put side by side and added up. */
export async function millNumbers(db: Db): Promise<MillNumbers> {
  const [sales, refunds, statusCounts, days, drying] = await Promise.all([
    salesByMonthAndSpecies(db), refundsByMonthAndSpecies(db), slabCountsByStatus(db), daysMilledToSold(db),
    listYardSlabs(db, { status: 'drying', sort: 'airDryExpectedOn', dir: 'asc', pageSize: '200' }),
  ]);
  const rows = sales.map((s) => {
    const r = refunds.find((x) => x.month === s.month && x.species_name === s.species_name);
    return {
      month: s.month, speciesName: s.species_name, boardFeet: round2(s.board_feet), slabs: s.slabs,
      ...money(s.wood_cents, s.services_cents, s.tax_cents, r?.wood_cents ?? 0, r?.services_cents ?? 0, r?.tax_cents ?? 0),
    };
  });
  const sum = (k: keyof SalesMoney) => rows.reduce((n, r) => n + r[k], 0);
  return {
    sales: rows,
    totals: money(sum('woodCents'), sum('servicesCents'), sum('taxCents'), sum('refundedWoodCents'), sum('refundedServicesCents'), sum('refundedTaxCents')),
    statusCounts,
    averageDaysMilledToSold: days.avgDays === null ? null : Math.round(days.avgDays * 10) / 10,
    soldSlabsWithMillDate: days.n,
    dryingStock: drying.items.map((r) => ({
      id: r.id, code: r.code, speciesName: r.species.name, thicknessIn: r.thicknessIn, moisturePercent: r.moisturePercent,
      expectedOn: r.airDry?.expectedOn ?? null, earliestOn: r.airDry?.earliestOn ?? null, latestOn: r.airDry?.latestOn ?? null,
      basis: r.airDry?.basis ?? 'not-enough-data',
    })),
  };
}

export function officeNumbersRoutes({ db }: { db: Db }) {
  const router = Router();
  router.get('/office/numbers', requireRole('admin'), async (_req, res) => {
    res.json(await millNumbers(db));
  });
  return router;
}
