#!/usr/bin/env node
// The engine ships as TypeScript source; tsx compiles it as it loads (DEVELOPERS.md, "Decisions").
import { register } from 'tsx/esm/api';

register();
await import('../src/cli/main.ts');
