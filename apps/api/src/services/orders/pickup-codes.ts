import crypto from 'node:crypto';

/**
 * Letters and digits that can't be mistaken for one another when read aloud
 * or off a phone screen: no 0/O/Q, 1/I/L, 2/Z, 5/S, 8/B, U/V.
 */
export const PICKUP_CODE_ALPHABET = 'ACDEFGHJKMNPRTWXY34679';
export const PICKUP_CODE_LENGTH = 6;

export function newPickupCode(): string {
  let code = '';
  for (let i = 0; i < PICKUP_CODE_LENGTH; i += 1) code += PICKUP_CODE_ALPHABET[crypto.randomInt(PICKUP_CODE_ALPHABET.length)];
  return code;
}

/** Normalises what someone typed: case, spaces and dashes don't matter. */
export function normalisePickupCode(input: string): string {
  return input.toUpperCase().replace(/[\s-]/g, '');
}
