import type { FieldErrors, Resolver } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { createSlabSchema, updateSlabSchema, type CreateSlab, type DefectFace, type DefectKind, type UpdateSlab, type YardSlabDetail } from '../../../../shared/slab-input';
import type { SlabStatus } from '../../../../shared/slabs';
import { inchesForInput } from '../../../../shared/wood/index';

/**
 * The form's own shape differs from the API's in a few places: sizes are the text typed ("2 1/4",
 * "8/4"), widths are objects (so useFieldArray can key them) and a set price is typed in dollars. Everything is still checked by
 * the shared zod schema; error paths are renamed back onto the form's fields.
 */
export type SlabFormValues = {
  logId: number;
  sequenceInLog: number;
  thicknessIn: string;
  lengthIn: string;
  widths: { value: string }[];
  liveEdge: 'none' | 'one' | 'both';
  figures: string[];
  figureNotes: string;
  /** Distance from the butt end as typed (text, like every size box); face '' = not said. */
  defects: { kind: DefectKind; note: string; fromButtIn: string; face: DefectFace | '' }[];
  yardStack: string;
  yardPosition: string;
  priceOverrideDollars: string;
  priceOverrideReason: string;
  description: string;
  status: SlabStatus;
};

export const FORM_FIELDS = ['logId', 'sequenceInLog', 'thicknessIn', 'lengthIn', 'widths', 'liveEdge', 'figures', 'figureNotes', 'defects',
  'yardStack', 'yardPosition', 'priceOverrideDollars', 'priceOverrideReason', 'description', 'status'];

export function toApi(v: SlabFormValues, isNew: boolean): Record<string, unknown> {
  const dollars = v.priceOverrideDollars.trim();
  const cents = dollars === '' ? null : Math.round(Number(dollars) * 100);
  const { widths, priceOverrideDollars: _d, logId, ...rest } = v;
  return {
    ...rest,
    ...(isNew ? { logId } : {}),
    sequenceInLog: Number.isNaN(v.sequenceInLog) ? undefined : v.sequenceInLog,
    widthsIn: widths.map((w) => w.value),
    defects: v.defects.map((d) => ({ kind: d.kind, note: d.note, fromButtIn: d.fromButtIn, face: d.face || null })),
    // A lone checkbox reports its value or false rather than a list.
    figures: Array.isArray(v.figures) ? v.figures : typeof v.figures === 'string' ? [v.figures] : [],
    priceOverrideCents: Number.isNaN(cents) ? Number.NaN : cents,
    priceOverrideReason: cents === null ? null : v.priceOverrideReason,
  };
}

/** Server or schema paths ("widthsIn.2", "priceOverrideCents") as the form names them. */
export function formFieldName(path: string): string {
  if (path === 'widthsIn') return 'widths.root';
  if (path.startsWith('widthsIn.')) return `widths.${path.split('.')[1]}.value`;
  if (path === 'priceOverrideCents') return 'priceOverrideDollars';
  return path;
}

function renameErrors(errors: FieldErrors): FieldErrors<SlabFormValues> {
  const out: Record<string, unknown> = { ...errors };
  const widths = errors.widthsIn as (Record<string, unknown> & { message?: string; type?: string; root?: { message?: string } }) | undefined;
  if (widths) {
    const list: unknown[] & { root?: { type: string; message: string } } = [];
    for (const [key, e] of Object.entries(widths)) if (/^\d+$/.test(key) && e) list[Number(key)] = { value: e };
    const rootMessage = (typeof widths.message === 'string' ? widths.message : undefined) ?? widths.root?.message;
    if (rootMessage) list.root = { type: 'validate', message: rootMessage };
    out.widths = list;
    delete out.widthsIn;
  }
  if (errors.priceOverrideCents) { out.priceOverrideDollars = errors.priceOverrideCents; delete out.priceOverrideCents; }
  return out as FieldErrors<SlabFormValues>;
}

export function slabResolver(isNew: boolean): Resolver<SlabFormValues, unknown, CreateSlab | UpdateSlab> {
  const inner = zodResolver(isNew ? createSlabSchema : updateSlabSchema) as unknown as Resolver<Record<string, unknown>, unknown, CreateSlab | UpdateSlab>;
  return async (values, context, options) => {
    const result = await inner(toApi(values, isNew), context, options as never);
    if (Object.keys(result.errors).length) return { values: {}, errors: renameErrors(result.errors) };
    return { values: result.values as CreateSlab | UpdateSlab, errors: {} };
  };
}

export function defaultsFor(slab: YardSlabDetail | undefined, logId: number | undefined): Partial<SlabFormValues> {
  if (!slab) {
    return {
      logId: logId ?? Number.NaN, sequenceInLog: Number.NaN, thicknessIn: '', lengthIn: '', widths: [{ value: '' }, { value: '' }, { value: '' }],
      liveEdge: 'both', figures: [], figureNotes: '', defects: [], yardStack: '', yardPosition: '',
      priceOverrideDollars: '', priceOverrideReason: '', description: '', status: 'drying',
    };
  }
  return {
    logId: slab.logId, sequenceInLog: slab.sequenceInLog, thicknessIn: inchesForInput(slab.thicknessIn), lengthIn: inchesForInput(slab.lengthIn),
    widths: slab.widthsIn.map((w) => ({ value: inchesForInput(w) })), liveEdge: slab.liveEdge as SlabFormValues['liveEdge'],
    figures: slab.figures, figureNotes: slab.figureNotes, yardStack: slab.yardStack,
    defects: slab.defects.map((d) => ({ kind: d.kind, note: d.note, fromButtIn: d.fromButtIn == null ? '' : inchesForInput(d.fromButtIn), face: d.face ?? '' })),
    yardPosition: slab.yardPosition, priceOverrideDollars: slab.priceOverrideCents === null ? '' : (slab.priceOverrideCents / 100).toFixed(2),
    priceOverrideReason: slab.priceOverrideReason ?? '', description: slab.description, status: slab.status,
  };
}
