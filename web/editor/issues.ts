/**
 * Placing the server's problems beside the form's fields: an issue names a field as a dotted path
 * in the request body (`scenario.atmosphere.profile.1.height_m`); the form's inputs carry the same
 * path without the `scenario.` prefix.
 */

export interface Issue {
  field: string;
  message: string;
}

/** Issues sorted to the field that shows them; those no field matches stay general. */
export interface PlacedIssues {
  byField: Map<string, string[]>;
  general: string[];
}

/** The scenario path an issue concerns ('' when it is not about the scenario). */
export function scenarioPath(field: string): string | null {
  if (field === 'scenario') return '';
  return field.startsWith('scenario.') ? field.slice('scenario.'.length) : null;
}

/**
 * Sorts issues to the form's fields: an exact path first, else the longest field path that is a
 * prefix of it (`atmosphere.profile` for `atmosphere.profile.7`); the rest are general, prefixed
 * with their field.
 * @param issues from ApiError.issues. @param fields the paths the form shows.
 */
export function placeIssues(issues: readonly Issue[], fields: readonly string[]): PlacedIssues {
  const byField = new Map<string, string[]>();
  const general: string[] = [];
  const known = [...fields].sort((a, b) => b.length - a.length);
  for (const issue of issues) {
    const path = scenarioPath(issue.field);
    const field = path === null || path === '' ? undefined : known.find((f) => path === f || path.startsWith(`${f}.`));
    if (field === undefined) {
      general.push(issue.field ? `${issue.field}: ${issue.message}` : issue.message);
      continue;
    }
    const extra = path !== null && path !== field ? `${path.slice(field.length + 1)}: ` : '';
    byField.set(field, [...(byField.get(field) ?? []), extra + issue.message]);
  }
  return { byField, general };
}
