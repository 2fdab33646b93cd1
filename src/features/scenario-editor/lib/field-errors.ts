import type { z } from 'zod';

type Issue = z.core.$ZodIssue;

// zod's own wording ("expected number to be >=0") reads like a type error; say it as a person would.
export function issueMessage(issue: Issue): string {
  switch (issue.code) {
    case 'too_small':
      return issue.inclusive ? `Must be at least ${String(issue.minimum)}` : `Must be more than ${String(issue.minimum)}`;
    case 'too_big':
      return issue.inclusive ? `Must be at most ${String(issue.maximum)}` : `Must be less than ${String(issue.maximum)}`;
    case 'invalid_type':
      return issue.expected === 'int' ? 'Enter a whole number' : 'Enter a number';
    default:
      return issue.message;
  }
}

// One message per field: the first issue at a path is the one to fix first.
export function issuesByPath(issues: readonly Issue[]): Record<string, string> {
  const errors: Record<string, string> = {};
  for (const issue of issues) {
    const path = issue.path.map(String).join('.') || '(root)';
    errors[path] ??= issueMessage(issue);
  }
  return errors;
}
