import { WoodMathError } from '../../shared/wood/index';

/**
 * The shared wood math names its inputs the way code does ("temperatureF must be between -4 and
 * 212 (got 300)"). A box on screen says the same thing in the words beside the box:
 * "Temperature must be between -4 and 212 °F". `labels` maps an input name to those words, with
 * an optional unit; an input not in the map gets `fallback`, never the developer's text.
 */
export function plainWoodError(error: unknown, labels: Record<string, { label: string; unit?: string }>, fallback = 'Those numbers could not be used.'): string {
  if (!(error instanceof WoodMathError)) return fallback;
  // Sizes typed into an inch box already come back in plain words.
  if (error.field === 'inches') return error.message;
  const words = error.field ? labels[error.field] : undefined;
  if (!words) return fallback;
  const prefix = `${error.field} `;
  if (!error.message.startsWith(prefix)) return fallback;
  const rest = error.message.slice(prefix.length).replace(/\s*\(got [^)]*\)\s*$/, '');
  return `${words.label} ${rest}${words.unit ? ` ${words.unit}` : ''}.`;
}
