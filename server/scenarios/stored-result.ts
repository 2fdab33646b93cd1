import { gunzipSync, gzipSync } from 'node:zlib';
import { toJsonFriendly } from '../../shared/schemas/runs';
import { AppError } from '../lib/app-error';

/** A stored result's ceiling, compressed: a typical run is far below it; only an oversized trajectory sample comes near. */
export const STORED_RESULT_MAX_BYTES = 1024 * 1024;

// Typed arrays in the parsed result would stringify as {"0": …} objects: store plain lists.
export function packResult(result: unknown): Buffer {
  const packed = gzipSync(JSON.stringify(toJsonFriendly(result)));
  if (packed.length > STORED_RESULT_MAX_BYTES)
    throw new AppError(
      413,
      'result_too_large',
      `This run's result is ${(packed.length / 1048576).toFixed(1)} MB compressed; the most a saved run may keep is 1 MB. Record fewer trajectory paths or frames and run again.`,
    );
  return packed;
}

export function unpackResult(row: { result: string; result_gz: Buffer | null }): unknown {
  return JSON.parse(row.result_gz ? gunzipSync(row.result_gz).toString('utf8') : row.result);
}
