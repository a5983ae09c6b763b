// Indices 0 .. count-1 joined into groups wherever linked(i, j) holds,
// directly or through a chain (union-find with path halving): one list per
// group, each in index order, the groups in the order of their first index.
export function unionGroups(count: number, linked: (i: number, j: number) => boolean): number[][] {
  const parent = new Int32Array(count);
  for (let i = 0; i < count; i++) parent[i] = i;
  const find = (i: number): number => {
    while (parent[i] !== i) {
      parent[i] = parent[parent[i] as number] as number;
      i = parent[i] as number;
    }
    return i;
  };
  for (let i = 0; i < count; i++) {
    for (let j = i + 1; j < count; j++) if (linked(i, j)) parent[find(i)] = find(j);
  }
  const groups = new Map<number, number[]>();
  for (let i = 0; i < count; i++) {
    const root = find(i);
    const g = groups.get(root);
    if (g) g.push(i);
    else groups.set(root, [i]);
  }
  return [...groups.values()];
}
