/**
 * `pairwright` command line: the same operations as the app, for scripts and quick looks.
 * Human-readable tables by default, `--json` for scripts, `--data DIR` to choose the store.
 * Bad input → one line on stderr and exit code 2; an unexpected failure → exit code 1.
 */
import { readFileSync, writeFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { parseArgs } from 'node:util';
import type { OperationInput, OperationName, OperationOutput } from '../../shared-model/api/contract';
import { defaultDataDir } from '../paths';
import { dispatchKnown } from '../services/dispatch';
import type { ServiceContext } from '../services/context';
import { checkWorkspace, closeWorkspace, isStoreRefusal, openWorkspace, restoreWorkspace } from '../services/workspace';
import { CliError, type CliCommand, type CliContext, type OptionSpec } from './command';
import { optionForField } from './field-option';
import { commands } from './commands/index';

const GLOBAL_OPTIONS: Record<string, OptionSpec> = {
  json: { type: 'boolean', description: 'print JSON for scripts' },
  data: { type: 'string', description: "folder of the store (default: the desktop app's data folder)" },
  help: { type: 'boolean', short: 'h', description: 'show help' },
  debug: { type: 'boolean', description: 'print the stack trace of an unexpected failure' },
};

function usageLine(command: CliCommand): string {
  return `pairwright ${command.words.join(' ')}${command.args ? ` ${command.args}` : ''}`;
}

export function helpText(selected?: CliCommand): string {
  if (selected) {
    const lines = [`usage: ${usageLine(selected)} [options]`, '', selected.summary, '', 'options:'];
    for (const [name, spec] of Object.entries({ ...selected.options, ...GLOBAL_OPTIONS })) {
      lines.push(`  --${name}${spec.type === 'string' ? ' VALUE' : ''}`.padEnd(28) + spec.description);
    }
    return lines.join('\n');
  }
  const lines = ['Pairwright command line', '', 'commands:'];
  for (const command of commands) {
    const usage = `  ${usageLine(command)}`;
    // Long usages get their summary on the next line so the columns stay readable.
    lines.push(
      usage.length < 50 ? usage.padEnd(52) + command.summary : `${usage}\n${' '.repeat(52)}${command.summary}`,
    );
  }
  lines.push('', 'every command takes --json (machine-readable output), --data DIR (choose the store) and --help');
  lines.push('pairwright help terms explains the terms and symbols (E, ω, ΔHmix, Warren–Cowley α, ΔBIC, routes)');
  return lines.join('\n');
}

/** The positions of words that may name the command: not options, and not the value of a global option. */
function wordPositions(argv: readonly string[]): number[] {
  const positions: number[] = [];
  for (let i = 0; i < argv.length; i++) {
    const arg = argv[i] as string;
    if (arg.startsWith('-')) {
      const name = arg.replace(/^--?/, '');
      if (!name.includes('=') && GLOBAL_OPTIONS[name]?.type === 'string') i++; // `--data DIR demo`
      continue;
    }
    positions.push(i);
  }
  return positions;
}

function findCommand(argv: readonly string[]): { command: CliCommand; rest: string[] } | null {
  const positions = wordPositions(argv);
  const words = positions.map((position) => argv[position]);
  let best: CliCommand | null = null;
  for (const command of commands) {
    const matches = command.words.every((word, index) => words[index] === word);
    if (matches && (!best || command.words.length > best.words.length)) best = command;
  }
  if (!best) return null;
  const used = new Set(positions.slice(0, best.words.length));
  return { command: best, rest: argv.filter((_arg, index) => !used.has(index)) };
}

export interface CliRunResult {
  exitCode: number;
  stdout: string;
  stderr: string;
}

/** Runs one CLI invocation; exported so tests and the bin script share it. */
export async function runCli(argv: readonly string[], env: NodeJS.ProcessEnv = process.env): Promise<CliRunResult> {
  const found = findCommand(argv);
  if (!found) {
    const wantsHelp = argv.length === 0 || argv.includes('--help') || argv.includes('-h') || argv[0] === 'help';
    if (wantsHelp) return { exitCode: 0, stdout: helpText(), stderr: '' };
    return {
      exitCode: 2,
      stdout: '',
      stderr: `pairwright: unknown command "${argv.filter((a) => !a.startsWith('-')).join(' ')}"; run pairwright --help`,
    };
  }
  const { command, rest } = found;
  let workspace: ServiceContext | null = null;
  try {
    let parsed;
    try {
      parsed = parseArgs({
        args: rest,
        options: { ...command.options, ...GLOBAL_OPTIONS },
        allowPositionals: true,
        strict: true,
      });
    } catch (error) {
      throw new CliError(error instanceof Error ? (error.message.split('\n')[0] ?? error.message) : String(error));
    }
    if (parsed.values.help === true) return { exitCode: 0, stdout: helpText(command), stderr: '' };
    const dataDir = typeof parsed.values.data === 'string' ? resolve(parsed.values.data) : defaultDataDir(env);
    const context: CliContext = {
      call: async <Name extends OperationName>(
        name: Name,
        input: OperationInput<Name>,
      ): Promise<OperationOutput<Name>> => {
        workspace ??= openWorkspace({ dataDir });
        const result = await dispatchKnown(workspace, name, input);
        if (!result.ok)
          throw new CliError(
            `${result.error.message}${optionForField(result.error.field, Object.keys(command.options ?? {}))}`,
          );
        return result.value;
      },
      readTextFile: (path) => {
        try {
          return readFileSync(resolve(path), 'utf8');
        } catch (error) {
          throw new CliError(`cannot read ${path}: ${(error as NodeJS.ErrnoException).code ?? String(error)}`);
        }
      },
      writeTextFile: (path, text) => writeFileSync(resolve(path), text, 'utf8'),
      maintenance: {
        dataDir,
        restore: (file) => restoreWorkspace(dataDir, file),
        check: () => checkWorkspace(dataDir),
      },
    };
    const output = await command.run({ positionals: parsed.positionals, values: parsed.values }, context);
    const stdout = parsed.values.json === true ? JSON.stringify(output.json, null, 2) : output.text;
    return { exitCode: 0, stdout, stderr: '' };
  } catch (error) {
    if (error instanceof CliError || isStoreRefusal(error))
      return { exitCode: 2, stdout: '', stderr: `pairwright: ${error.message}` };
    const debug = argv.includes('--debug');
    const message = error instanceof Error ? error.message : String(error);
    const detail =
      debug && error instanceof Error ? (error.stack ?? message) : `${message} (run again with --debug for details)`;
    return { exitCode: 1, stdout: '', stderr: `pairwright: unexpected failure: ${detail}` };
  } finally {
    const opened = workspace as ServiceContext | null;
    if (opened) await closeWorkspace(opened);
  }
}

export async function cliMain(): Promise<void> {
  const result = await runCli(process.argv.slice(2));
  if (result.stdout) process.stdout.write(result.stdout.endsWith('\n') ? result.stdout : `${result.stdout}\n`);
  if (result.stderr) process.stderr.write(result.stderr.endsWith('\n') ? result.stderr : `${result.stderr}\n`);
  process.exitCode = result.exitCode;
}
