import type { z } from 'zod';

/**
 * Plain words for zod's generic issues, so shared schemas read well in a form.
 * Messages a schema sets itself (e.g. the slug pattern) still win.
 */
export function friendlyIssue(issue: z.core.$ZodRawIssue): string | undefined {
  switch (issue.code) {
    case 'too_small':
      if (issue.origin === 'string') {
        return issue.minimum === 1 ? 'Fill this in.' : `Use at least ${issue.minimum} characters.`;
      }
      return `Use ${issue.minimum} or more.`;
    case 'too_big':
      return issue.origin === 'string'
        ? `Keep it to ${issue.maximum} characters or fewer.`
        : `Use ${issue.maximum} or less.`;
    case 'invalid_type':
      return issue.expected === 'number' ? 'Enter a number.' : 'Fill this in.';
    case 'invalid_format':
      return issue.format === 'email'
        ? 'Enter an e-mail address like marin@example.test.'
        : undefined;
    default:
      return undefined;
  }
}
