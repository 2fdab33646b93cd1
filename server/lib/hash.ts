import { createHash } from 'node:crypto';
import { canonicalJson } from '../../shared/schemas/canonical-json';

export const inputHash = (input: unknown) => createHash('sha256').update(canonicalJson(input)).digest('hex');
