import { Router } from 'express';
import type { Db } from '../../db/client';
import { requireRole } from '../../lib/session';
import type { MillNumbers } from '../../../shared/office';
import { daysMilledToSold, salesByMonthAndSpecies, slabCountsByStatus } from './numbers.repo';
import { listYardSlabs } from '../slabs/yard-inventory.service';

const round2 = (n: number) => Math.round(n * 100) / 100;

/** The mill's numbers: all sums and averages are computed by the database. */
export async function millNumbers(db: Db): Promise<MillNumbers> {
  const [sales, statusCounts, days, drying] = await Promise.all([
    salesByMonthAndSpecies(db), slabCountsByStatus(db), daysMilledToSold(db),
    listYardSlabs(db, { status: 'drying', sort: 'airDryExpectedOn', dir: 'asc', pageSize: '200' }),
  ]);
  return {
    sales: sales.map((r) => ({ month: r.month, speciesName: r.species_name, boardFeet: round2(r.board_feet), revenueCents: r.revenue_cents, slabs: r.slabs })),
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
