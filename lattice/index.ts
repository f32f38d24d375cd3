/**
 * Leeway's valuation engine: interacting real options on a binomial lattice.
 * Pure TypeScript with no I/O, so it runs on the server, in a Web Worker and in the CLI.
 */
export { largestStepsWithinBudget, valueProject, type ValueOptions } from './value-project';
export { explainNode, type NodeExplanation, type NodeRef } from './explain';
export { prepareModel, parseModel } from './check-model';
export { rightIds, templateIds } from './compile-templates';
export { ModelError, type ModelIssue } from './errors';
export { projectModelSchema, optionTemplateSchema, costSchema, windowSchema, treeKindSchema } from './schema';
export type { ProjectModel, OptionTemplate, Cost, ExerciseWindow, TreeKind, ModeInput, SwitchInput } from './schema';
export type * from './result';
export { ENGINE_VERSION } from './version';
export { isNeverUsed, isPlanLike, PLAN_LIKE } from './right-usage';
export { openSteps, type Snap } from './window';
export { readStoredResult } from './stored-result';
export { readStoredModel, readStoredTemplates } from './stored-model';
export { MAX_STEPS, MAX_MODES, NODE_BUDGET, MAX_DECISION_CELLS, MAX_REQUEST_CELLS } from './limits';
