const count = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

/** "30 rings and 12 holes", "1 ring and 0 holes". */
export function formatPieces(rings: number, holes: number): string {
  return `${count(rings, 'ring', 'rings')} and ${count(holes, 'hole', 'holes')}`;
}
