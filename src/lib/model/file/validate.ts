/** Validation of a current-version document: schema first, then the links between records. */
import * as v from 'valibot';
import { checkIntegrity, type DocumentProblem } from '../integrity';
import type { HeadrouteDocument } from '../types';
import { MAX_ELEMENTS } from './limits';
import { issueToProblem } from './messages';
import { DocumentSchema } from './schema';

/** Most problems reported for one file (the rest are summarised in one line). */
export const MAX_REPORTED_PROBLEMS = 50;

/** Outcome of validating a document against the schema */
export type ValidationResult =
  { ok: true; document: HeadrouteDocument } | { ok: false; errors: DocumentProblem[] };

function capped(errors: DocumentProblem[]): DocumentProblem[] {
  if (errors.length <= MAX_REPORTED_PROBLEMS) return errors;
  return [
    ...errors.slice(0, MAX_REPORTED_PROBLEMS),
    {
      path: '$',
      message: `…and ${errors.length - MAX_REPORTED_PROBLEMS} more problems.`,
    },
  ];
}

/**
 * Check `value` against the document schema and the record links; on success the typed
 * document (a fresh object holding only known fields).
 */
export function validateDocument(value: unknown): ValidationResult {
  const parsed = v.safeParse(DocumentSchema, value);
  if (!parsed.success) {
    return { ok: false, errors: capped(parsed.issues.map((i) => issueToProblem(i, value))) };
  }
  const doc = parsed.output as HeadrouteDocument;
  const elements = Object.keys(doc.nodes).length + Object.keys(doc.pipes).length;
  if (elements > MAX_ELEMENTS) {
    return {
      ok: false,
      errors: [
        {
          path: 'pipes',
          message: `The project has ${elements.toLocaleString('en')} elements (nodes and pipes together); Headroute works with at most ${MAX_ELEMENTS.toLocaleString('en')}, as when adding parts.`,
        },
      ],
    };
  }
  const problems = checkIntegrity(doc);
  if (problems.length > 0) return { ok: false, errors: capped(problems) };
  return { ok: true, document: doc };
}
