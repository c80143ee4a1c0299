/** `pairwright help terms`: the glossary the app's help panel shows. */
import { GLOSSARY, glossaryText } from '../../../shared-model/glossary/terms';
import type { CliCommand } from '../command';

export const helpCommands: CliCommand[] = [
  {
    words: ['help', 'terms'],
    args: '',
    summary: 'Explain the terms and symbols the app uses (E, ω, ΔHmix, Warren–Cowley α, ΔBIC, routes…)',
    options: {},
    run: async () => ({ json: { terms: GLOSSARY }, text: glossaryText() }),
  },
];
