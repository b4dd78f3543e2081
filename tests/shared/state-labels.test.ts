import fs from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { dryingStateLabel, LIVE_EDGE, LIVE_EDGE_LABELS, SAWING_METHOD_LABELS, SAWING_METHODS, SLAB_STATUS_LABELS, SLAB_STATUSES } from '../../shared/slabs';
import { ORDER_STATUS_LABELS, ORDER_STATUSES } from '../../shared/checkout';
import { ORDER_STATUSES as OFFICE_ORDER_STATUSES, USER_ROLE_LABELS, USER_ROLES } from '../../shared/office';
import { HOLD_STATUS_LABELS, HOLD_STATUSES } from '../../shared/holds';
import { DEFECT_KINDS, DEFECT_LABELS } from '../../shared/slab-input';
import { METER_KIND_LABELS, METER_KINDS } from '../../shared/readings';
import { DRYING_STATES } from '../../shared/wood/index';

type LabelSet = { name: string; values: readonly string[]; labels: Record<string, string> };

/** Every state list people can meet, with its one set of words. */
const SETS: LabelSet[] = [
  { name: 'slab statuses', values: SLAB_STATUSES, labels: SLAB_STATUS_LABELS },
  { name: 'order statuses', values: ORDER_STATUSES, labels: ORDER_STATUS_LABELS },
  { name: 'hold statuses', values: HOLD_STATUSES, labels: HOLD_STATUS_LABELS },
  { name: 'drying states', values: DRYING_STATES.map((d) => d.state), labels: Object.fromEntries(DRYING_STATES.map((d) => [d.state, d.label])) },
  { name: 'roles', values: USER_ROLES, labels: USER_ROLE_LABELS },
  { name: 'defect kinds', values: DEFECT_KINDS, labels: DEFECT_LABELS },
  { name: 'meter kinds', values: METER_KINDS, labels: METER_KIND_LABELS },
  { name: 'sawing methods', values: SAWING_METHODS, labels: SAWING_METHOD_LABELS },
  { name: 'edges', values: LIVE_EDGE, labels: LIVE_EDGE_LABELS },
];

/** Problems with one label set: a state without words, words shared by two states, or the code name shown as words. */
export function labelSetProblems({ name, values, labels }: LabelSet): string[] {
  const problems: string[] = [];
  for (const v of values) {
    const words = labels[v];
    if (typeof words !== 'string' || !words.trim()) problems.push(`${name}: "${v}" has no words`);
    else if (/^[a-z]+(-[a-z]+)+$/.test(words) || (words === v && /[-_]/.test(v))) problems.push(`${name}: "${v}" is shown as its code name`);
  }
  for (const key of Object.keys(labels)) if (!values.includes(key)) problems.push(`${name}: words for "${key}", which is not a state`);
  const seen = new Map<string, string>();
  for (const v of values) {
    const w = labels[v]?.toLowerCase();
    if (w && seen.has(w)) problems.push(`${name}: "${seen.get(w)}" and "${v}" read the same ("${labels[v]}")`);
    if (w) seen.set(w, v);
  }
  return problems;
}

const escape = (s: string) => s.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
const stripComments = (src: string) => src.replace(/\/\*[\s\S]*?\*\//g, '').replace(/(^|[^:'"`])\/\/.*$/gm, '$1');

/**
 * A file keeping its own words for a state list: three or more of the list's states written as
 * keys with text after them (`listed: 'On sale'`), or a `Record<SlabStatus, string>` of its own.
 */
export function ownLabelMaps(source: string, sets: LabelSet[] = SETS): string[] {
  const src = stripComments(source);
  const found: string[] = [];
  for (const set of sets.filter((s) => s.values.length >= 3)) {
    const keyed = set.values.filter((v) => new RegExp(`(^|[\\s{,])['"]?${escape(v)}['"]?\\s*:\\s*['"\`]`, 'm').test(src));
    if (keyed.length >= 3) found.push(`its own words for ${set.name} (${keyed.join(', ')})`);
  }
  const typed = /Record<\s*(SlabStatus|OrderStatus|HoldStatus|DryingState|UserRole|MeterKind)\s*,\s*string\s*>/.exec(src);
  if (typed) found.push(`a Record<${typed[1]}, string> of its own`);
  return found;
}

/** Files whose state-keyed text is sentence fragments for the demo's invented descriptions, not words for a state. */
const PROSE_NOT_LABELS = ['server/seed/demo-descriptions.ts'];

function sourceFiles(dir: string): string[] {
  return fs.readdirSync(dir, { withFileTypes: true }).flatMap((e) => {
    const p = path.join(dir, e.name);
    if (e.isDirectory()) return sourceFiles(p);
    return /\.(ts|tsx)$/.test(e.name) ? [p] : [];
  });
}

describe('one set of words for each state', () => {
  it.each(SETS.map((s) => [s.name, s] as const))('every one of the %s has its own plain words', (_name, set) => {
    expect(labelSetProblems(set)).toEqual([]);
  });

  it('the order state list is one list, not two that can drift apart', () => {
    expect(OFFICE_ORDER_STATUSES).toBe(ORDER_STATUSES);
  });

  it('the catalogue and the yard name a drying state with the same words as the list', () => {
    for (const d of DRYING_STATES) expect(dryingStateLabel(d.state)).toBe(d.label);
  });

  it('no screen, e-mail or file under src/ or server/ keeps its own words for a state', () => {
    const offenders = [...sourceFiles('src'), ...sourceFiles('server')]
      .filter((file) => !PROSE_NOT_LABELS.includes(file.split(path.sep).join('/')))
      .flatMap((file) => ownLabelMaps(fs.readFileSync(file, 'utf8')).map((what) => `${file}: ${what}`));
    expect(offenders).toEqual([]);
  });

  // The checks above must be able to fail: they are tried on made-up files and sets here.
  it('catches a screen that words the slab statuses its own way, and one that types its own map', () => {
    const screen = `const WORDS = {\n  drying: 'Drying', ready: 'Dry, not listed', listed: 'On sale', held: 'On hold',\n};`;
    expect(ownLabelMaps(screen)).toEqual(['its own words for slab statuses (drying, ready, listed, held)']);
    expect(ownLabelMaps(`const x: Record<OrderStatus, string> = {} as never;`)).toEqual(['a Record<OrderStatus, string> of its own']);
    expect(ownLabelMaps(`// listed: 'a', held: 'b', sold: 'c' only in a comment\nconst y = SLAB_STATUS_LABELS.listed;`)).toEqual([]);
  });

  it('catches a state without words, a code name shown as words and two states worded alike', () => {
    expect(labelSetProblems({ name: 'x', values: ['a', 'b-c', 'd', 'e'], labels: { a: 'Alpha', 'b-c': 'b-c', d: 'Same', e: 'same' } }))
      .toEqual(['x: "b-c" is shown as its code name', 'x: "d" and "e" read the same ("same")']);
    expect(labelSetProblems({ name: 'x', values: ['a', 'b'], labels: { a: 'Alpha' } })).toEqual(['x: "b" has no words']);
  });
});
