import { describe, expect, it } from 'vitest';
import { boxCatalogue, boxLabel, boxPieces, boxSizeSchema, boxTypes, wrongKindMessage } from './boxes.js';

describe('the box catalogue', () => {
  it('a dozen is 12 and a half dozen 6 (the words’ dictionary sense); a bag of holes starts at 12 (common practice, no source)', () => {
    expect(Object.fromEntries(boxTypes.map((b) => [b.size, b.pieces]))).toEqual({ dozen: 12, 'half-dozen': 6, holes: 12 });
  });

  it('rings go in the dozen and the half dozen, holes in the bag', () => {
    expect(Object.fromEntries(boxTypes.map((b) => [b.size, b.takes]))).toEqual({ dozen: 'ring', 'half-dozen': 'ring', holes: 'hole' });
    expect(boxPieces('dozen', 12)).toEqual({ rings: 12, holes: 0 });
    expect(boxPieces('holes', 15)).toEqual({ rings: 0, holes: 15 });
  });

  it('has one label per size, and every size the schema accepts is in it', () => {
    expect(boxSizeSchema.options.map(boxLabel)).toEqual(['A dozen', 'A half dozen', 'A bag of holes']);
    for (const size of boxSizeSchema.options) expect(boxCatalogue[size].size).toBe(size);
  });

  it('names the mismatch when an item of the wrong kind goes in a box', () => {
    expect(wrongKindMessage('holes', 'Vanilla', 'ring')).toBe("Vanilla is a ring and can't go in a bag of holes");
    expect(wrongKindMessage('dozen', 'Sugar holes', 'hole')).toBe("Sugar holes is a hole and can't go in a dozen");
    expect(wrongKindMessage('dozen', 'Vanilla', 'ring')).toBeNull();
  });
});
