/**
 * Worksheets as files: content/worksheets/*.yml hold one worksheet each. parseWorksheetYaml reads
 * one file's text (the caller reads the file, so this stays pure and runs anywhere), validates it
 * with validateWorksheet and throws a WorksheetFileError naming the file, the field and the line.
 */
import { LineCounter, isNode, parseDocument } from 'yaml';
import type { Worksheet } from './schema';
import { validateWorksheet, type CompileOptions } from './evaluate';

export interface WorksheetFileProblem {
  /** Field path, e.g. "worksheet.steps.2.expression". */
  field: string;
  message: string;
  /** 1-based line of the field in the file, when it can be found. */
  line?: number;
}

export class WorksheetFileError extends Error {
  readonly fileName: string;
  readonly problems: WorksheetFileProblem[];
  constructor(fileName: string, problems: WorksheetFileProblem[]) {
    const lines = problems.map((p) => `  ${fileName}${p.line ? `:${p.line}` : ''}: ${p.field}: ${p.message}`);
    super(`${fileName}: ${problems.length === 1 ? 'a problem' : `${problems.length} problems`} in this worksheet\n${lines.join('\n')}`);
    this.name = 'WorksheetFileError';
    this.fileName = fileName;
    this.problems = problems;
    Object.setPrototypeOf(this, WorksheetFileError.prototype);
  }
}

/** Parses and validates one worksheet file. Throws WorksheetFileError. */
export function parseWorksheetYaml(text: string, fileName: string, opts: CompileOptions = {}): Worksheet {
  const lineCounter = new LineCounter();
  const doc = parseDocument(text, { lineCounter, prettyErrors: false, uniqueKeys: true });
  if (doc.errors.length > 0) {
    throw new WorksheetFileError(
      fileName,
      doc.errors.map((e) => ({
        field: 'yaml',
        message: e.message.split('\n')[0],
        line: e.linePos?.[0]?.line ?? (e.pos ? lineCounter.linePos(e.pos[0]).line : undefined),
      })),
    );
  }
  const json = doc.toJS({ maxAliasCount: 50 });
  const result = validateWorksheet(json, opts);
  if (result.ok) return result.worksheet;
  const problems = Object.entries(result.fields).map(([field, message]) => {
    const path = field
      .split('.')
      .slice(1)
      .map((p) => (/^\d+$/.test(p) ? Number(p) : p));
    // The deepest node of the path that exists in the file (a missing field points at its parent).
    let line: number | undefined;
    for (let n = path.length; n >= 0; n--) {
      const node = n === 0 ? doc.contents : doc.getIn(path.slice(0, n), true);
      if (isNode(node) && node.range) {
        line = lineCounter.linePos(node.range[0]).line;
        break;
      }
    }
    return { field, message, line };
  });
  throw new WorksheetFileError(fileName, problems);
}
