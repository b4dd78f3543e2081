/**
 * Runs first in `npm start`: when another process already holds the PGlite data folder, say so at
 * once instead of after the client build. (The shop itself takes the lock when it opens the folder;
 * this is only the early word.)
 */
import { DataDirBusyError, dataDirHolder } from '../server/db/data-dir-lock';
import { dbTarget, fail } from './db-target';

const target = dbTarget();
if (target.kind === 'pglite') {
  const holder = await dataDirHolder(target.dataDir);
  if (holder) fail(new DataDirBusyError(target.dataDir, holder === 'unknown' ? null : holder).message);
}
