/**
 * `npm run content:export [dir]`: writes the live library (each entry's latest published version)
 * to `dir` (default content/entries) in the starter-file format, one `<slug>.md` per entry.
 */
import path from 'node:path';
import { ROOT } from '../config';
import { runCommand, withDatabase } from './command';
import { writeExport } from './seed-entries';

runCommand(async () => {
  const dir = path.resolve(process.argv[2] ?? path.join(ROOT, 'content', 'entries'));
  const files = await withDatabase(() => writeExport(dir));
  console.log(
    files.length
      ? `Wrote ${files.length} entries to ${path.relative(process.cwd(), dir) || dir}.`
      : 'The library has no published entries; nothing written.',
  );
});
