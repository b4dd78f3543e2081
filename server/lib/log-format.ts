const LEVEL_TAG: Record<string, string> = { trace: 'TRACE', debug: 'DEBUG', info: 'INFO ', warn: 'WARN ', error: 'ERROR', fatal: 'FATAL' };
const SHOWN_FIRST = new Set(['time', 'level', 'msg', 'reqId', 'err']);
const REQUEST_FIELDS = new Set(['method', 'route', 'path', 'status', 'ms', 'ip']);

/**
 * Development output: one JSON log line as one readable line, e.g.
 * "14:02:07 INFO  GET /api/slabs/:id 200 12 ms [7K3D-Q9XA-2MBF]", with other fields as key=value and
 * an error's stack below.
 */
export function formatLine(jsonLine: string): string {
  let o: Record<string, unknown>;
  try { o = JSON.parse(jsonLine); } catch { return jsonLine; }
  const time = typeof o.time === 'string' ? o.time.slice(11, 19) : '';
  const head = [time, LEVEL_TAG[String(o.level)] ?? String(o.level)];
  // A catch-all route pattern says less than the path itself.
  const where = typeof o.route === 'string' && !o.route.includes('{*') ? o.route : o.path;
  if (o.method) head.push(`${o.method} ${where ?? ''} ${o.status ?? ''} ${o.ms ?? '?'} ms`);
  if (o.msg && !o.method) head.push(String(o.msg));
  if (o.reqId) head.push(`[${o.reqId}]`);
  const rest = Object.entries(o).filter(([k]) => !SHOWN_FIRST.has(k) && !(o.method && REQUEST_FIELDS.has(k))).map(([k, v]) => `${k}=${typeof v === 'string' ? v : JSON.stringify(v)}`);
  const err = o.err as { message?: string; stack?: string } | undefined;
  const tail = err ? `\n    ${(err.stack ?? err.message ?? '').split('\n').join('\n    ')}` : '';
  return `${head.join(' ')}${rest.length ? `  ${rest.join(' ')}` : ''}${tail}\n`;
}
