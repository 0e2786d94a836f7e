/**
 * `npm run content:export [dir]`: writes the live library (each entry's latest published version)
 * to `dir` (default content/entries) in the starter-file format, one `<slug>.md` per entry, and the
 * trade's synonym groups to `synonyms.yml` in the folder above it (default content/synonyms.yml).
 */
import path from 'node:path';
import { ROOT } from '../config';
import { runCommand, withDatabase } from './command';
import { writeSynonymsExport } from './seed';
import { writeExport } from './seed-entries';

runCommand(async () => {
  const dir = path.resolve(process.argv[2] ?? path.join(ROOT, 'content', 'entries'));
  const synonymsFile = path.join(path.dirname(dir), 'synonyms.yml');
  const [files, groups] = await withDatabase(async () => [await writeExport(dir), await writeSynonymsExport(synonymsFile)] as const);
  console.log(
    files.length
      ? `Wrote ${files.length} entries to ${path.relative(process.cwd(), dir) || dir}.`
      : 'The library has no published entries; nothing written.',
  );
  console.log(`Wrote ${groups} synonym groups to ${path.relative(process.cwd(), synonymsFile) || synonymsFile}.`);
});
