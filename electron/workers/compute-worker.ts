/**
 * A worker thread of the compute pool: runs one task at a time (a line-scan fit, an energy, a relaxation) and
 * answers its value, or its error as a value (a domain error with its code and field; anything else with its
 * stack, so the main thread rethrows it and dispatch logs it).
 */
import { parentPort } from 'node:worker_threads';
import { DomainError } from '../../shared-model/api/result';
import { runComputeTask } from '../services/compute-tasks';
import type { ComputeFailure, ComputeReply, ComputeRequest } from './compute-messages';

function failureOf(error: unknown): ComputeFailure {
  if (error instanceof DomainError)
    return { kind: 'domain', code: error.code, message: error.message, field: error.field ?? null };
  const message = error instanceof Error ? error.message : String(error);
  const stack = error instanceof Error ? (error.stack ?? null) : null;
  return { kind: error instanceof RangeError ? 'range' : 'other', message, stack };
}

parentPort?.on('message', (request: ComputeRequest) => {
  let reply: ComputeReply;
  try {
    reply = { id: request.id, ok: true, value: runComputeTask(request.kind, request.args) };
  } catch (error) {
    reply = { id: request.id, ok: false, failure: failureOf(error) };
  }
  parentPort?.postMessage(reply);
});
