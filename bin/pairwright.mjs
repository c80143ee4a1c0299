#!/usr/bin/env node
// The `pairwright` command (package.json "bin"): runs the TypeScript CLI through tsx.
import { register } from 'tsx/esm/api';

register();
await import('../electron/cli/bin.ts');
