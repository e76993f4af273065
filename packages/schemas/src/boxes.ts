import { z } from 'zod';

/**
 * The box catalogue: the one place that knows which boxes Fryline sells,
 * what each is called, how many pieces it holds and which kind of piece
 * goes in it. The API, both apps, the mails and the production sheet read
 * their box facts from here.
 */

export const pieceKinds = ['ring', 'hole'] as const;
export const pieceKindSchema = z.enum(pieceKinds);
export type PieceKind = z.infer<typeof pieceKindSchema>;

/** Box sizes in the order they are offered. */
export const boxSizes = ['dozen', 'half-dozen', 'holes'] as const;
export const boxSizeSchema = z.enum(boxSizes);
export type BoxSize = z.infer<typeof boxSizeSchema>;

export interface BoxType {
  size: BoxSize;
  /** How the box is named on every screen, mail and sheet. */
  label: string;
  /** Pieces it holds; for the bag of holes the usual fill, which the owner may change per bake day. */
  pieces: number;
  /** The kind of piece that goes in it. */
  takes: PieceKind;
}

/**
 * A dozen is 12 and a half dozen 6 (the words' dictionary sense); a bag of
 * holes usually starts at 12 (common practice, no source).
 */
export const boxCatalogue: Readonly<Record<BoxSize, BoxType>> = {
  dozen: { size: 'dozen', label: 'A dozen', pieces: 12, takes: 'ring' },
  'half-dozen': { size: 'half-dozen', label: 'A half dozen', pieces: 6, takes: 'ring' },
  holes: { size: 'holes', label: 'A bag of holes', pieces: 12, takes: 'hole' },
};

/** The catalogue as a list, in offering order. */
export const boxTypes: readonly BoxType[] = boxSizes.map((size) => boxCatalogue[size]);

export const boxLabel = (size: BoxSize): string => boxCatalogue[size].label;
export const boxTakes = (size: BoxSize): PieceKind => boxCatalogue[size].takes;

/** Rings and holes in a box of this size holding `pieces`. */
export function boxPieces(size: BoxSize, pieces: number): { rings: number; holes: number } {
  return boxTakes(size) === 'hole' ? { rings: 0, holes: pieces } : { rings: pieces, holes: 0 };
}

/** Why an item of `kind` can't go in a box of `size`, or null when it can. */
export function wrongKindMessage(size: BoxSize, itemName: string, kind: PieceKind): string | null {
  if (boxTakes(size) === kind) return null;
  return `${itemName} is a ${kind} and can't go in ${boxLabel(size).replace(/^A /, 'a ')}`;
}
