/**
 * The one error the engine throws on bad input. Every issue names the field (a dotted path such
 * as `underlying.volatility` or `options[1].window.to`) and the rule it broke, so a form can put
 * the message beside the right input and a CLI can print it on one line.
 */
export interface ModelIssue {
  field: string;
  message: string;
}

export class ModelError extends Error {
  readonly issues: ModelIssue[];

  constructor(issues: ModelIssue[]) {
    super(issues.map((issue) => issue.message).join('; '));
    this.name = 'ModelError';
    this.issues = issues;
  }
}

export function refuse(field: string, rule: string): never {
  throw new ModelError([{ field, message: `${field} ${rule}` }]);
}
