import type { z } from 'zod';

/**
 * One API operation: its input schema and (as a phantom type) its result value type.
 * The contract is a record of these; both transports and the renderer's client derive from it.
 */
export interface OperationSpec<Input extends z.ZodType, Output> {
  input: Input;
  /** Never read at run time: carries the output type for the client. */
  readonly output?: Output;
  /** Long operations return a job id and report progress by events. */
  kind: 'query' | 'command';
  summary: string;
}

export function operation<Output>() {
  return <Input extends z.ZodType>(spec: {
    input: Input;
    kind: 'query' | 'command';
    summary: string;
  }): OperationSpec<Input, Output> => spec;
}
