import pino, { type DestinationStream, type Logger } from 'pino';
import { formatLine } from './log-format';

export type { Logger };
export type LogFormat = 'json' | 'pretty';

const EMAIL = /([A-Za-z0-9._%+-])[A-Za-z0-9._%+-]*@([A-Za-z0-9.-]+\.[A-Za-z]{2,})/g;

/** "priya@example.test" → "p…@example.test": enough to tell accounts apart, not enough to write to them. */
export const maskEmails = (text: string) => text.replace(EMAIL, '$1…@$2');

// Keys whose values never reach a log line, wherever they sit in a logged object.
const SECRET_KEYS = /^(password|newPassword|currentPassword|token|cardToken|card|cvc|cookie|set-cookie|authorization|secret)$/i;

/** Masks e-mail addresses in every string and hides secret-named keys, a few levels deep. */
export function scrub(value: unknown, depth = 0): unknown {
  if (typeof value === 'string') return maskEmails(value);
  if (depth > 5 || value === null || typeof value !== 'object') return value;
  if (value instanceof Error) return scrub(pino.stdSerializers.err(value), depth);
  if (Array.isArray(value)) return value.map((v) => scrub(v, depth + 1));
  const out: Record<string, unknown> = {};
  for (const [k, v] of Object.entries(value)) out[k] = SECRET_KEYS.test(k) ? '[hidden]' : scrub(v, depth + 1);
  return out;
}

export type LoggerOptions = { level?: string; format?: LogFormat; destination?: DestinationStream };

/**
 * One JSON object per line (production, tests), or short readable lines (development). Every line
 * passes through scrub(): no passwords, cookies, card data or whole e-mail addresses.
 */
export function createLogger({ level = 'info', format = 'json', destination }: LoggerOptions = {}): Logger {
  const out: DestinationStream = destination ?? (format === 'pretty'
    ? { write: (line: string) => { process.stdout.write(formatLine(line)); } }
    : pino.destination({ dest: 1, sync: true }));
  return pino({
    level,
    base: undefined,
    timestamp: pino.stdTimeFunctions.isoTime,
    formatters: {
      level: (label) => ({ level: label }),
      log: (obj) => scrub(obj) as Record<string, unknown>,
    },
    hooks: {
      // Messages are scrubbed as well as fields.
      logMethod(args, method) {
        method.apply(this, args.map((a) => (typeof a === 'string' ? maskEmails(a) : a)) as Parameters<typeof method>);
      },
    },
  }, out);
}

/** The format and level from LOG_FORMAT / LOG_LEVEL, defaulting by NODE_ENV. */
export function loggerOptionsFor(env: { NODE_ENV: string; LOG_LEVEL?: string; LOG_FORMAT?: LogFormat }): LoggerOptions {
  const level = env.LOG_LEVEL ?? (env.NODE_ENV === 'test' ? 'warn' : 'info');
  const format = env.LOG_FORMAT ?? (env.NODE_ENV === 'development' ? 'pretty' : 'json');
  return { level, format };
}

let current: Logger = createLogger(loggerOptionsFor({ NODE_ENV: process.env.NODE_ENV ?? 'development' }));

/** The process's logger; modules without a request at hand (jobs, mail, outbox) log through it. */
export const getLogger = () => current;
/** Set once at start-up from the validated settings. */
export function setLogger(logger: Logger) { current = logger; }
