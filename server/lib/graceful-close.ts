import type { Server } from 'node:http';
import net, { type Socket } from 'node:net';
import type { Logger } from './logger';

type Conn = { active: number; served: number; idleTimer?: NodeJS.Timeout };

/**
 * Tracks the server's connections so shutdown can be gentle: stop listening, let every request
 * already received finish, close keep-alive connections as soon as they fall quiet, and give a
 * connection that was accepted but has not yet sent its request a moment to do so (Node's own
 * server.close() would drop it unanswered). Call it right after listen().
 */
export function gracefulCloser(server: Server, logger: Logger, { firstRequestWaitMs = 2_000 } = {}) {
  const conns = new Map<Socket, Conn>();
  let closing = false;

  const quiet = (socket: Socket, c: Conn) => {
    if (!closing || c.active > 0) return;
    if (c.served > 0) { socket.end(); return; }
    c.idleTimer ??= setTimeout(() => socket.destroy(), firstRequestWaitMs);
  };

  server.on('connection', (socket: Socket) => {
    const c: Conn = { active: 0, served: 0 };
    conns.set(socket, c);
    socket.once('close', () => { clearTimeout(c.idleTimer); conns.delete(socket); });
  });
  server.on('request', (req, res) => {
    const socket = req.socket;
    const c = conns.get(socket);
    if (!c) return;
    clearTimeout(c.idleTimer);
    c.idleTimer = undefined;
    c.active++;
    res.once('close', () => {
      c.active--;
      c.served++;
      quiet(socket, c);
    });
  });

  return {
    /** Resolves when every connection has closed; connections still busy after graceMs are cut. */
    close(graceMs: number): Promise<void> {
      closing = true;
      const done = new Promise<void>((resolve) => {
        // net.Server's close: stop accepting without http.Server's "close every idle connection now".
        net.Server.prototype.close.call(server, () => resolve());
      });
      for (const [socket, c] of conns) quiet(socket, c);
      const deadline = setTimeout(() => {
        const busy = [...conns.values()].filter((c) => c.active > 0).length;
        logger.warn({ part: 'shutdown', graceMs, busy }, 'requests still running at the end of the grace period; closing their connections');
        for (const socket of conns.keys()) socket.destroy();
      }, graceMs);
      return done.finally(() => clearTimeout(deadline));
    },
  };
}
