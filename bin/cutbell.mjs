#!/usr/bin/env node
// The `cutbell` command for a global install: runs the TypeScript command line through tsx.
import { register } from 'tsx/esm/api';

register();
await import('../src/cli/main.ts');
