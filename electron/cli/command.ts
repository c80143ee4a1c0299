/**
 * The shape of a CLI command. Each area adds a file in `commands/` exporting `CliCommand[]` and one
 * line in `commands/index.ts`. Commands call the same service functions as the app, through `call`.
 */
import type { OperationInput, OperationName, OperationOutput } from '../../shared-model/api/contract';
import { readUserNumber } from '../../shared-model/text/user-number';

export type OptionSpec = { type: 'string' | 'boolean'; short?: string; multiple?: boolean; description: string };

export interface CliContext {
  /** Runs an API operation; a failure becomes a CliError with the operation's message. */
  call<Name extends OperationName>(name: Name, input: OperationInput<Name>): Promise<OperationOutput<Name>>;
  /** Reads a file the user named (path relative to the working directory). */
  readTextFile(path: string): string;
  writeTextFile(path: string, text: string): void;
  /** Store maintenance that needs the store closed (restore, full check); the store is not opened for these. */
  maintenance: {
    dataDir: string;
    restore(file: string): Promise<{
      restoredFrom: string;
      previousStoreKeptAt: string | null;
      fromSchemaVersion: number;
      schemaVersion: number;
    }>;
    check(): { path: string; schemaVersion: number };
  };
}

export interface ParsedArgs {
  positionals: string[];
  values: Record<string, string | boolean | (string | boolean)[] | undefined>;
}

/** What a command prints: `json` with --json, otherwise `text` (a table or sentences). */
export interface CommandOutput {
  json: unknown;
  text: string;
}

export interface CliCommand {
  /** Words that select the command, e.g. ["campaigns", "list"] or ["predict"]. */
  words: string[];
  /** Positional arguments as shown in usage, e.g. "<campaign> <pair>". */
  args: string;
  summary: string;
  options: Record<string, OptionSpec>;
  run(args: ParsedArgs, context: CliContext): Promise<CommandOutput>;
}

/** A user error: printed as one line, exit code 2. */
export class CliError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'CliError';
  }
}

export function requireString(args: ParsedArgs, name: string): string {
  const value = args.values[name];
  if (typeof value !== 'string' || value.trim() === '') throw new CliError(`--${name} is required`);
  return value;
}

export function optionalString(args: ParsedArgs, name: string): string | undefined {
  const value = args.values[name];
  return typeof value === 'string' ? value : undefined;
}

/** Reads typed number text with the one reader (shared-model/text/user-number.ts); a refusal names `what`. */
export function readNumberText(text: string, what: string): number {
  if (text.trim() === '') throw new CliError(`${what} must be a number, got nothing`);
  const result = readUserNumber(text);
  if (!result.ok) throw new CliError(`${what} must be a number: ${result.message}`);
  return result.value;
}

/** Parses a numeric option (decimal comma accepted, thousands separators refused); bad text names the option. */
export function optionalNumber(args: ParsedArgs, name: string): number | undefined {
  const value = optionalString(args, name);
  return value === undefined ? undefined : readNumberText(value, `--${name}`);
}

export function requirePositional(args: ParsedArgs, index: number, name: string): string {
  const value = args.positionals[index];
  if (value === undefined || value.trim() === '') throw new CliError(`missing <${name}>`);
  return value;
}
