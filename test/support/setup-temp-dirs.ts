/**
 * vitest setupFiles entry: removes each test's temporary folders after it (see temp-dirs.ts). Registered
 * before a test file's own hooks, so with vitest's default `sequence.hooks: 'stack'` these after-hooks run
 * last, once the file's afterEach/afterAll have closed its stores and hosts.
 */
import { afterAll, afterEach, beforeEach } from 'vitest';
import { enterTest, leaveFile, leaveTest } from './temp-dirs';

beforeEach(() => enterTest());
afterEach(() => leaveTest());
afterAll(() => leaveFile());
