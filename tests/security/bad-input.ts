import fc from 'fast-check';

/** Field names from every zod object schema in shared/, so bad values land on real fields too. */
export async function sharedFieldNames(): Promise<string[]> {
  const modules = await Promise.all([
    import('../../shared/accounts'), import('../../shared/checkout'), import('../../shared/holds'),
    import('../../shared/logs'), import('../../shared/office'), import('../../shared/photos'),
    import('../../shared/pickups'), import('../../shared/readings'), import('../../shared/slab-input'),
    import('../../shared/slabs'),
  ]);
  const names = new Set<string>();
  for (const mod of modules) {
    for (const value of Object.values(mod)) {
      const shape = (value as { shape?: Record<string, unknown> } | null)?.shape;
      if (shape && typeof shape === 'object') Object.keys(shape).forEach((k) => names.add(k));
    }
  }
  return [...names].sort();
}

const deep = (levels: number): unknown => (levels === 0 ? 'bottom' : { a: [deep(levels - 1)] });

/**
 * A JSON body (as text) that no route may accept: every case carries at least one thing that is
 * wrong by construction — a top-level value that is not an object, a real field holding an
 * object or array where a scalar or list of scalars belongs, unknown fields, deep nesting, or a
 * body past the size limit.
 */
export function badBody(fields: string[]): fc.Arbitrary<string> {
  const junkScalar = fc.oneof(
    fc.integer({ min: -1e9, max: -1 }), fc.constant(-0), fc.constant(1e308), fc.constant(-1e308),
    fc.string({ maxLength: 20 }), fc.boolean(), fc.constant(null),
  );
  const wrongValue = fc.oneof(
    fc.dictionary(fc.string({ minLength: 1, maxLength: 8 }), junkScalar, { minKeys: 1, maxKeys: 3 }),
    fc.array(fc.dictionary(fc.string({ minLength: 1, maxLength: 5 }), junkScalar, { minKeys: 1, maxKeys: 2 }), { minLength: 1, maxLength: 3 }),
    fc.constant({ $gt: '' }),
    fc.integer({ min: 2, max: 40 }).map(deep),
  );
  const knownFieldWrong = fc.tuple(
    fc.uniqueArray(fc.constantFrom(...fields), { minLength: 1, maxLength: 4 }),
    wrongValue,
  ).map(([keys, v]) => JSON.stringify(Object.fromEntries(keys.map((k) => [k, v]))));
  return fc.oneof(
    fc.oneof(fc.array(junkScalar, { maxLength: 4 }), fc.string({ maxLength: 30 }), fc.integer(), fc.constant(null)).map((v) => JSON.stringify(v)),
    knownFieldWrong,
    fc.dictionary(fc.string({ minLength: 1, maxLength: 12 }).filter((k) => !fields.includes(k)), junkScalar, { minKeys: 1, maxKeys: 4 })
      .map((o) => JSON.stringify({ ...o, zzNotAField: 1 })),
    // Built as text: deeper than JSON.stringify itself could recurse.
    fc.integer({ min: 500, max: 5000 }).map((n) => `${'{"a":['.repeat(n)}0${']}'.repeat(n)}`),
    fc.constant(JSON.stringify({ note: 'x'.repeat(200_000) })),
    fc.constantFrom('{"unclosed": ', '{"a":1}}', 'NaN', '\u0000', '{"__proto__": {"role": "admin"}}'),
  );
}
