/** Messages between the compute pool (main thread) and its worker threads. */
import type { ApiErrorCode } from '../../shared-model/api/result';
import type { ComputeArgs, ComputeKind } from '../services/compute-tasks';

export interface ComputeRequest<Kind extends ComputeKind = ComputeKind> {
  id: number;
  kind: Kind;
  args: ComputeArgs<Kind>;
}

/** A failure keeps its kind: a domain error (code, field), a RangeError (an allocation the input asked for), or other. */
export type ComputeFailure =
  | { kind: 'domain'; code: ApiErrorCode; message: string; field: string | null }
  | { kind: 'range' | 'other'; message: string; stack: string | null };

export type ComputeReply =
  { id: number; ok: true; value: unknown } | { id: number; ok: false; failure: ComputeFailure };
