#!/usr/bin/env node
import('../dist/bin/main.js').then((cli) => cli.run(process.argv.slice(2)));
