/** Commands on the project as a whole: its name and settings. */
import * as v from 'valibot';
import { MAX_NAME_LENGTH } from '../file/limits';
import { SettingsSchema } from '../file/schema';
import type { ProjectSettings } from '../types';
import type { Command } from './command';
import { assignPatch, validateRecord } from './check';
import { commandErrors } from './errors';

/** Change project settings; the result is checked against the schema. */
export function updateSettings(patch: Partial<ProjectSettings>): Command {
  return {
    label: 'Edit project settings',
    run(draft) {
      assignPatch(draft.settings as unknown as Record<string, unknown>, patch);
      return validateRecord(SettingsSchema, draft.settings, '');
    },
  };
}

/** Rename the project. */
export function renameDocument(name: string): Command {
  return {
    label: 'Rename project',
    run(draft) {
      if (!v.is(v.pipe(v.string(), v.maxLength(MAX_NAME_LENGTH)), name)) {
        return commandErrors.invalid(
          '',
          `A name must be text of at most ${MAX_NAME_LENGTH} characters.`,
        );
      }
      draft.name = name;
    },
  };
}
