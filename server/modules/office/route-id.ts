import { notFound } from '../../lib/errors';

/** A numeric id from the URL; anything else is simply "not found". */
export function parseRouteId(raw: string, what: string): number {
  const id = Number(raw);
  if (!Number.isInteger(id) || id <= 0 || id > 2_147_483_647) throw notFound(what);
  return id;
}
