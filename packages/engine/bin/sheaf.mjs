#!/usr/bin/env node
// Runs the engine CLI from its TypeScript source through tsx, so it never goes stale.
import { register } from 'tsx/esm/api';

register();
await import('../src/cli.ts');
