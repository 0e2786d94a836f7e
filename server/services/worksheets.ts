/** The starter worksheets in content/worksheets/, read and validated once per process. */
import fs from 'node:fs';
import path from 'node:path';
import { ROOT } from '../config';
import { kitFunctions } from '../../shared/checks/kit-functions';
import type * as Load from '../../shared/worksheet/load';
import type { Worksheet } from '../../shared/worksheet/schema';

let cache: Map<string, Worksheet> | null = null;

export function starterWorksheets(dir = path.join(ROOT, 'content', 'worksheets')): Map<string, Worksheet> {
  if (cache) return cache;
  // Loaded at the first read, not with the app: validating a worksheet brings mathjs (about a second to load).
  // eslint-disable-next-line @typescript-eslint/no-require-imports
  const { parseWorksheetYaml } = require('../../shared/worksheet/load') as typeof Load;
  const found = new Map<string, Worksheet>();
  for (const file of fs.readdirSync(dir).filter((f) => f.endsWith('.yml')).sort()) {
    const ws = parseWorksheetYaml(fs.readFileSync(path.join(dir, file), 'utf8'), file, { functions: kitFunctions });
    found.set(ws.name, ws);
  }
  cache = found;
  return found;
}
