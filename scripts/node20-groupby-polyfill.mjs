// The auth library's CLI targets Node 22, whose parser dependency calls Object.groupBy (added in
// Node 21). This project runs on Node 20, so the CLI is started with this shim preloaded.
if (typeof Object.groupBy !== 'function') {
  Object.groupBy = (items, key) => {
    const out = Object.create(null);
    let i = 0;
    for (const item of items) (out[key(item, i++)] ??= []).push(item);
    return out;
  };
}
if (typeof Map.groupBy !== 'function') {
  Map.groupBy = (items, key) => {
    const out = new Map();
    let i = 0;
    for (const item of items) {
      const k = key(item, i++);
      if (!out.has(k)) out.set(k, []);
      out.get(k).push(item);
    }
    return out;
  };
}
