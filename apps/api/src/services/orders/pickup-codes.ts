import crypto from 'node:crypto';
import { PICKUP_CODE_ALPHABET, PICKUP_CODE_LENGTH } from '@fryline/schemas';

// The alphabet and the look-alike mapping live in @fryline/schemas, so the
// staff app's search and the API's lookup forgive the same typing.
export { PICKUP_CODE_ALPHABET, PICKUP_CODE_LENGTH, normalisePickupCode } from '@fryline/schemas';

export function newPickupCode(): string {
  let code = '';
  for (let i = 0; i < PICKUP_CODE_LENGTH; i += 1) code += PICKUP_CODE_ALPHABET[crypto.randomInt(PICKUP_CODE_ALPHABET.length)];
  return code;
}
