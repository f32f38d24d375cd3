// Generated from GET /api/v1/openapi.json by openapi-typescript (npm run api:types). Do not edit.
export interface paths {
    "/api/v1/projects": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /**
         * List projects with their latest and approved figures
         * @description Roles: Admin, Analyst, Reviewer, Executive (read-only).
         */
        get: operations["listProjects"];
        put?: never;
        /**
         * Create a project
         * @description Roles: Admin, Analyst.
         */
        post: operations["createProject"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/v1/projects/{projectId}": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /**
         * Read a project
         * @description Roles: Admin, Analyst, Reviewer, Executive (read-only).
         */
        get: operations["getProject"];
        put?: never;
        post?: never;
        /**
         * Delete a project none of whose cases was ever submitted
         * @description A project with a submitted case keeps its record: archive it instead (409).
         *
         *     Roles: Admin, Analyst.
         */
        delete: operations["deleteProject"];
        options?: never;
        head?: never;
        /**
         * Rename, describe, archive or restore a project
         * @description Roles: Admin, Analyst.
         */
        patch: operations["updateProject"];
        trace?: never;
    };
    "/api/v1/projects/{projectId}/activity": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /**
         * The audit trail of a project and its cases, newest first
         * @description Roles: Admin, Analyst, Reviewer, Executive (read-only).
         */
        get: operations["listProjectActivity"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/v1/projects/{projectId}/cases": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /**
         * A project's cases with their latest figures
         * @description Roles: Admin, Analyst, Reviewer, Executive (read-only).
         */
        get: operations["listProjectCases"];
        put?: never;
        /**
         * Create a case: cash flows, settings and rights
         * @description Roles: Admin, Analyst.
         */
        post: operations["createCase"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/v1/cases": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /**
         * Every case of the organisation, by project
         * @description Roles: Admin, Analyst, Reviewer, Executive (read-only).
         */
        get: operations["listCases"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/v1/cases/{caseId}": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /**
         * Read a case
         * @description Roles: Admin, Analyst, Reviewer, Executive (read-only).
         */
        get: operations["getCase"];
        put?: never;
        post?: never;
        /**
         * Delete a case never submitted
         * @description Roles: Admin, Analyst.
         */
        delete: operations["deleteCase"];
        options?: never;
        head?: never;
        /**
         * Save a case's inputs
         * @description Send the whole case with the version it was read at; an edit based on an older version is refused (409). Only drafts and returned cases can be edited.
         *
         *     Roles: Admin, Analyst.
         */
        patch: operations["updateCase"];
        trace?: never;
    };
    "/api/v1/cases/{caseId}/duplicate": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        /**
         * Copy a case under a new name (a scenario)
         * @description Roles: Admin, Analyst.
         */
        post: operations["duplicateCase"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/v1/cases/{caseId}/revisions": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        /**
         * Start a new draft version of an approved case
         * @description Roles: Admin, Analyst.
         */
        post: operations["reviseCase"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/v1/cases/{caseId}/cash-flows/import": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        /**
         * Preview or import cash flows from a workbook
         * @description Without confirm=true the answer is a preview; with confirm=true and the case version, the cash flows are saved.
         *
         *     Roles: Admin, Analyst.
         */
        post: operations["importCashFlows"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/v1/cases/{caseId}/export.xlsx": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /**
         * The case as a workbook: inputs, figures and cautions
         * @description Roles: Admin, Analyst, Reviewer, Executive (read-only).
         */
        get: operations["exportCase"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/v1/cases/{caseId}/valuations": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /**
         * A case's stored runs, newest first
         * @description Roles: Admin, Analyst, Reviewer, Executive (read-only).
         */
        get: operations["listCaseValuations"];
        put?: never;
        /**
         * Value the stored case and keep the run
         * @description Roles: Admin, Analyst.
         */
        post: operations["valueCase"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/v1/cases/{caseId}/valuations/{runId}/rerun": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        /**
         * Re-run a stored run: does today's engine reproduce it?
         * @description Values the run’s stored model again with the current engine and compares result hashes (SHA-256 of canonical JSON). Nothing is stored. When the hashes differ, `moved` lists the figures that changed and `partsThatDiffer` the parts of the result.
         *
         *     Roles: Admin, Analyst, Reviewer.
         */
        post: operations["rerunValuation"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/v1/cases/{caseId}/cross-checks": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /**
         * The case's latest cross-checks, newest first
         * @description Roles: Admin, Analyst, Reviewer, Executive (read-only).
         */
        get: operations["listCrossChecks"];
        put?: never;
        /**
         * Cross-check the case's value by an independent least-squares Monte Carlo
         * @description Queues a least-squares Monte Carlo (Longstaff & Schwartz 2001) of the case as saved, on its own code path, and compares it with the lattice (docs/engine.md §11). Follow it by its id.
         *
         *     Roles: Admin, Analyst, Reviewer.
         */
        post: operations["startCrossCheck"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/v1/cases/{caseId}/cross-checks/{crossCheckId}": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /**
         * A cross-check: progress, and when done both estimates, the lattice and the verdict
         * @description Roles: Admin, Analyst, Reviewer, Executive (read-only).
         */
        get: operations["getCrossCheck"];
        put?: never;
        post?: never;
        /**
         * Cancel a running cross-check
         * @description Roles: Admin, Analyst, Reviewer.
         */
        delete: operations["cancelCrossCheck"];
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/v1/valuations": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        /**
         * Value an engine model (nothing is stored)
         * @description The body is the engine model of docs/engine.md. `?extras=false` skips convergence and the premium split (one lattice pass); `?paths=true` adds each right's boundary from every mode it can be used from.
         *
         *     Roles: Admin, Analyst, Reviewer, Executive (read-only).
         */
        post: operations["valueModel"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/v1/cases/{caseId}/snapshots": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /**
         * A case's review history: every submitted version
         * @description Roles: Admin, Analyst, Reviewer, Executive (read-only).
         */
        get: operations["listSnapshots"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/v1/cases/{caseId}/submit": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        /**
         * Submit a case for review with a recommendation
         * @description The case is valued, and the snapshot frozen with its inputs, figures and the recommendation.
         *
         *     Roles: Analyst.
         */
        post: operations["submitCase"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/v1/cases/{caseId}/withdraw": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        /**
         * Take back your own submission before a decision
         * @description Roles: Analyst.
         */
        post: operations["withdrawCase"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/v1/cases/{caseId}/approve": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        /**
         * Approve the version in review
         * @description Nobody approves their own submission. The board pack is rendered and the analyst told by e-mail.
         *
         *     Roles: Reviewer.
         */
        post: operations["approveCase"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/v1/cases/{caseId}/return": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        /**
         * Return the version in review with a reason
         * @description Roles: Reviewer.
         */
        post: operations["returnCase"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/v1/cases/{caseId}/comments": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /**
         * The review discussion of a case
         * @description Roles: Admin, Analyst, Reviewer, Executive (read-only).
         */
        get: operations["listComments"];
        put?: never;
        /**
         * Comment on a section of a case
         * @description Roles: Admin, Analyst, Reviewer.
         */
        post: operations["addComment"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/v1/reviews": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /**
         * The review queue
         * @description Roles: Admin, Analyst, Reviewer.
         */
        get: operations["listReviews"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/v1/cases/{caseId}/observations": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        /**
         * Record the project's value on a date after approval
         * @description The value is in the case’s currency and units. Refused: a date before the approval of the version followed, in the future, or beyond the model’s horizon (422, the rule named).
         *
         *     Roles: Admin, Analyst.
         */
        post: operations["addObservation"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/v1/cases/{caseId}/observations/import": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        /**
         * Record a dated series of the project's value from a file
         * @description A CSV or XLSX with dates (YYYY-MM-DD) in the first column and values in the second, a header row allowed (the reader of the volatility history). Each value follows the rules of a single observation; a refusal names its line or cell and records nothing (422).
         *
         *     Roles: Admin, Analyst.
         */
        post: operations["importObservations"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/v1/cases/{caseId}/rights/{rightId}/decisions": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        /**
         * Record that a followed right was exercised, declined or postponed
         * @description Exercised and declined are final: from that date the watched model starts in the mode the decision made, and the right leaves the watch. Refused: an unknown right (404), a second final decision on a right (409), a date out of order, before approval, in the future or beyond the horizon (422).
         *
         *     Roles: Admin, Analyst.
         */
        post: operations["recordRightDecision"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/v1/cases/{caseId}/watch": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /**
         * Where each approved right stands now
         * @description Today, with the latest observed value (or the approved one) and the decisions recorded: per right its status, critical value, side and distance, and the approved model re-valued from today.
         *
         *     Roles: Admin, Analyst, Reviewer, Executive (read-only).
         */
        get: operations["watchCase"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/v1/cases/{caseId}/board-pack": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /**
         * The board pack of the case's latest approved version
         * @description Roles: Admin, Analyst, Reviewer, Executive (read-only).
         */
        get: operations["boardPack"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/v1/cases/{caseId}/validation-report": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /**
         * The validation report of the case as saved (PDF)
         * @description Conventions in plain words, inputs and their sources, convergence, the premium's split, sensitivities, the version's latest cross-check and the engine's published-value checks, with the cautions (docs/engine.md §11).
         *
         *     Roles: Admin, Analyst, Reviewer, Executive (read-only).
         */
        get: operations["validationReport"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/v1/cases/{caseId}/validation-report.xlsx": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /**
         * The validation report of the case as saved, as a workbook
         * @description Roles: Admin, Analyst, Reviewer, Executive (read-only).
         */
        get: operations["validationWorkbook"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/v1/cases/{caseId}/validation-report/attachments": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        /**
         * Keep the validation report (A4) with the case's documents
         * @description A reviewer attaches it before deciding; analysts and admins may too.
         *
         *     Roles: Admin, Analyst, Reviewer.
         */
        post: operations["attachValidationReport"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/v1/cases/{caseId}/attachments": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /**
         * A case's supporting documents
         * @description Roles: Admin, Analyst, Reviewer, Executive (read-only).
         */
        get: operations["listAttachments"];
        put?: never;
        /**
         * Attach a PDF, XLSX, CSV or PNG to a case
         * @description Roles: Admin, Analyst.
         */
        post: operations["addAttachment"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/v1/attachments/{attachmentId}": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /**
         * Download a supporting document
         * @description Roles: Admin, Analyst, Reviewer, Executive (read-only).
         */
        get: operations["getAttachment"];
        put?: never;
        post?: never;
        /**
         * Remove a supporting document
         * @description Roles: Admin, Analyst.
         */
        delete: operations["deleteAttachment"];
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/v1/compare": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /**
         * Two to four cases side by side
         * @description Roles: Admin, Analyst, Reviewer, Executive (read-only).
         */
        get: operations["compareCases"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/v1/compare.xlsx": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /**
         * The comparison as a workbook
         * @description Roles: Admin, Analyst, Reviewer, Executive (read-only).
         */
        get: operations["exportComparison"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/v1/templates/cash-flows.xlsx": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /**
         * A cash-flow workbook to fill in and import
         * @description Roles: Admin, Analyst, Reviewer, Executive (read-only).
         */
        get: operations["cashFlowTemplate"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/v1/volatility/history": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        /**
         * Annualised volatility from a dated history of values
         * @description Send a CSV or XLSX upload (field "file"), or JSON { series: [{ date, value }] }.
         *
         *     Roles: Admin, Analyst.
         */
        post: operations["volatilityFromHistory"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/v1/volatility/simulations": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        /**
         * Start a Monte Carlo volatility estimate for a case
         * @description Roles: Admin, Analyst.
         */
        post: operations["startSimulation"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/v1/volatility/simulations/{simulationId}": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /**
         * A volatility estimate: progress and result
         * @description Roles: Admin, Analyst, Reviewer, Executive (read-only).
         */
        get: operations["getSimulation"];
        put?: never;
        post?: never;
        /**
         * Cancel a running volatility estimate
         * @description Roles: Admin, Analyst.
         */
        delete: operations["cancelSimulation"];
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/v1/portfolio.csv": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /**
         * Each project's approved figures as CSV
         * @description Roles: Admin, Analyst, Reviewer, Executive (read-only).
         */
        get: operations["portfolioCsv"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/v1/portfolio.xlsx": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /**
         * Each project's approved figures as a workbook
         * @description Roles: Admin, Analyst, Reviewer, Executive (read-only).
         */
        get: operations["portfolioXlsx"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/v1/portfolio/revaluations": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        /**
         * Re-value every case valued by an older engine
         * @description Roles: Admin, Analyst.
         */
        post: operations["startRevaluation"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/v1/portfolio/revaluations/{revaluationId}": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /**
         * A portfolio re-valuation: progress and outcome
         * @description Roles: Admin, Analyst, Reviewer, Executive (read-only).
         */
        get: operations["getRevaluation"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/v1/settings": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /**
         * The organisation's defaults
         * @description Roles: Admin, Analyst, Reviewer, Executive (read-only).
         */
        get: operations["getSettings"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        /**
         * Change the organisation's defaults
         * @description Roles: Admin.
         */
        patch: operations["updateSettings"];
        trace?: never;
    };
    "/api/v1/organisations/{orgId}/settings": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /**
         * An organisation's defaults, by its id
         * @description Roles: Admin, Analyst, Reviewer, Executive (read-only).
         */
        get: operations["getOrganisationSettings"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/v1/api-keys": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /**
         * The organisation's API keys
         * @description Roles: Admin.
         */
        get: operations["listApiKeys"];
        put?: never;
        /**
         * Create an API key
         * @description The answer holds the secret, once. The key acts with the role given, in this organisation, while its creator is an admin here.
         *
         *     Roles: Admin.
         */
        post: operations["createApiKey"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/v1/api-keys/{keyId}": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        post?: never;
        /**
         * Revoke an API key
         * @description Roles: Admin.
         */
        delete: operations["revokeApiKey"];
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/v1/openapi.json": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /**
         * This document
         * @description Roles: Admin, Analyst, Reviewer, Executive (read-only).
         */
        get: operations["openApiDocument"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
}
export type webhooks = Record<string, never>;
export interface components {
    schemas: {
        ProjectSummary: {
            /** @description An opaque identifier. */
            id: string;
            name: string;
            description: string;
            currency: string;
            /** @enum {string} */
            status: "active" | "archived";
            ownerName: string | null;
            caseCount: number;
            /**
             * Format: date-time
             * @description An ISO 8601 instant (UTC).
             */
            updatedAt: string;
            latest: components["schemas"]["Headline"] | null;
            approved: components["schemas"]["Approval"] | null;
            inReview: number;
        };
        /** @description A case's latest stored valuation run, in figures. */
        Headline: {
            /** @description An opaque identifier. */
            runId: string;
            /** @description An opaque identifier. */
            caseId: string;
            caseName: string;
            caseVersion: number;
            currentVersion: number;
            engineVersion: string;
            /** @description An amount in the project's currency and units. */
            staticNpv: number;
            /** @description An amount in the project's currency and units. */
            optionPremium: number;
            /** @description An amount in the project's currency and units. */
            expandedNpv: number;
            /**
             * Format: date-time
             * @description An ISO 8601 instant (UTC).
             */
            valuedAt: string;
        };
        /** @description The version of a project last approved, and its figures. */
        Approval: {
            /** @description An opaque identifier. */
            snapshotId: string;
            /** @description An opaque identifier. */
            caseId: string;
            caseName: string;
            caseVersion: number;
            /** @description An amount in the project's currency and units. */
            staticNpv: number;
            /** @description An amount in the project's currency and units. */
            optionPremium: number;
            betterPlan: number | null;
            flexibility: number | null;
            /** @description An amount in the project's currency and units. */
            expandedNpv: number;
            /**
             * Format: date-time
             * @description An ISO 8601 instant (UTC).
             */
            decidedAt: string;
        };
        /** @description Every error answer has this shape. */
        Error: {
            error: {
                /** @enum {string} */
                code: "bad_request" | "unauthorized" | "forbidden" | "not_found" | "conflict" | "too_large" | "unsupported_media_type" | "unprocessable" | "rate_limited" | "unavailable" | "internal";
                /** @description A sentence for people: what is wrong and what to do. */
                message: string;
                /** @description Messages per input field (422), by dotted path. */
                fields?: {
                    [key: string]: string[];
                };
            };
        };
        Project: {
            /** @description An opaque identifier. */
            id: string;
            name: string;
            description: string;
            /** @description ISO 4217 code. */
            currency: string;
            /** @enum {string} */
            status: "active" | "archived";
            ownerId: string | null;
            /**
             * Format: date-time
             * @description An ISO 8601 instant (UTC).
             */
            createdAt: string;
            /**
             * Format: date-time
             * @description An ISO 8601 instant (UTC).
             */
            updatedAt: string;
        };
        ActivityEntry: {
            id: string | number;
            /** @description What was done, such as project.create or case.approve. */
            action: string;
            subjectType: string;
            subjectId: string | null;
            detail: {
                [key: string]: unknown;
            };
            /** @description A person, or an API key as "API key <name> (created by …)"; null when deleted. */
            actor: string | null;
            /**
             * Format: date-time
             * @description An ISO 8601 instant (UTC).
             */
            at: string;
        };
        Case: {
            /** @description An opaque identifier. */
            id: string;
            /** @description An opaque identifier. */
            projectId: string;
            name: string;
            /** @description Send it back with an edit: an edit based on an older version is refused (409). */
            version: number;
            /** @enum {string} */
            status: "draft" | "in_review" | "approved" | "returned";
            cashFlows: {
                rows: {
                    year: number;
                    revenue: number;
                    operatingCost: number;
                    capex: number;
                    tax: number;
                    workingCapital: number;
                }[];
                wacc: number;
                /**
                 * @default end-of-year
                 * @enum {string}
                 */
                timing: "end-of-year" | "mid-year";
            };
            settings: {
                volatility: number;
                riskFreeRate: number;
                steps: number;
                /**
                 * @default crr
                 * @enum {string}
                 */
                tree: "crr" | "jarrow-rudd" | "tian" | "trigeorgis";
                volatilitySource?: {
                    /** @enum {string} */
                    method: "direct" | "history" | "monte-carlo";
                    note: string;
                };
            };
            options: ({
                /** @constant */
                kind: "expand";
                id?: string;
                factor: number;
                cost: number | {
                    amount: number;
                    growth: number;
                } | {
                    from: number;
                    amount: number;
                }[];
                window: {
                    /** @constant */
                    kind: "american";
                    from: number;
                    to: number;
                } | {
                    /** @constant */
                    kind: "bermudan";
                    dates: number[];
                } | {
                    /** @constant */
                    kind: "european";
                    at: number;
                };
            } | {
                /** @constant */
                kind: "contract";
                id?: string;
                fraction: number;
                savings: number | {
                    amount: number;
                    growth: number;
                } | {
                    from: number;
                    amount: number;
                }[];
                window: {
                    /** @constant */
                    kind: "american";
                    from: number;
                    to: number;
                } | {
                    /** @constant */
                    kind: "bermudan";
                    dates: number[];
                } | {
                    /** @constant */
                    kind: "european";
                    at: number;
                };
            } | {
                /** @constant */
                kind: "abandon";
                id?: string;
                salvage: number | {
                    amount: number;
                    growth: number;
                } | {
                    from: number;
                    amount: number;
                }[];
                fixedSalvage?: boolean;
                window: {
                    /** @constant */
                    kind: "american";
                    from: number;
                    to: number;
                } | {
                    /** @constant */
                    kind: "bermudan";
                    dates: number[];
                } | {
                    /** @constant */
                    kind: "european";
                    at: number;
                };
            } | {
                /** @constant */
                kind: "defer";
                id?: string;
                cost: number | {
                    amount: number;
                    growth: number;
                } | {
                    from: number;
                    amount: number;
                }[];
                window: {
                    /** @constant */
                    kind: "american";
                    from: number;
                    to: number;
                } | {
                    /** @constant */
                    kind: "bermudan";
                    dates: number[];
                } | {
                    /** @constant */
                    kind: "european";
                    at: number;
                };
            } | {
                /** @constant */
                kind: "stage";
                id?: string;
                payments: {
                    at: number;
                    amount: number;
                }[];
            } | {
                /** @constant */
                kind: "mothball";
                id?: string;
                toScale: number;
                cost: number | {
                    amount: number;
                    growth: number;
                } | {
                    from: number;
                    amount: number;
                }[];
                backCost: number | {
                    amount: number;
                    growth: number;
                } | {
                    from: number;
                    amount: number;
                }[];
                flowPerYear?: number;
                window?: {
                    /** @constant */
                    kind: "american";
                    from: number;
                    to: number;
                } | {
                    /** @constant */
                    kind: "bermudan";
                    dates: number[];
                } | {
                    /** @constant */
                    kind: "european";
                    at: number;
                };
            })[];
            /**
             * Format: date-time
             * @description An ISO 8601 instant (UTC).
             */
            createdAt: string;
            /**
             * Format: date-time
             * @description An ISO 8601 instant (UTC).
             */
            updatedAt: string;
        };
        ValuationRun: {
            /** @description An opaque identifier. */
            id: string;
            caseVersion: number;
            inputHash: string;
            engineVersion: string;
            /**
             * Format: date-time
             * @description An ISO 8601 instant (UTC).
             */
            createdAt: string;
            warnings: unknown[];
            /** @description The engine model the case compiles to (docs/engine.md). */
            input: {
                [key: string]: unknown;
            };
            result: components["schemas"]["ValuationResult"];
        };
        /** @description The engine's result (docs/engine.md): figures, rights, exercise boundaries, convergence. */
        ValuationResult: {
            /** @description Present value of the project at time 0 (V0). */
            value: number;
            /** @description An amount in the project's currency and units. */
            staticNpv: number;
            /** @description An amount in the project's currency and units. */
            optionPremium: number;
            /** @description An amount in the project's currency and units. */
            expandedNpv: number;
        } & {
            [key: string]: unknown;
        };
        ValuationRunSummary: {
            /** @description An opaque identifier. */
            id: string;
            caseVersion: number;
            inputHash: string;
            engineVersion: string;
            /**
             * Format: date-time
             * @description An ISO 8601 instant (UTC).
             */
            createdAt: string;
            /** @description A person, or an API key as "API key <name> (created by …)"; null when deleted. */
            createdBy: string | null;
            volatilitySource: unknown | null;
            /** @description SHA-256 of the result in canonical JSON (RFC 8785). */
            resultHash: string;
            /** @description An amount in the project's currency and units. */
            value: number;
            /** @description An amount in the project's currency and units. */
            staticNpv: number;
            /** @description An amount in the project's currency and units. */
            expandedNpv: number;
            /** @description An amount in the project's currency and units. */
            optionPremium: number;
        };
        RerunOutcome: {
            /** @description An opaque identifier. */
            runId: string;
            caseVersion: number;
            storedEngineVersion: string;
            /** @description The engine that ran it now. */
            engineVersion: string;
            storedHash: string;
            resultHash: string;
            /** @description True when the hashes are identical: the same figures to the last bit. */
            reproduced: boolean;
            moved: {
                figure: string;
                stored: number | null;
                now: number | null;
                change: number | null;
            }[];
            partsThatDiffer: string[];
        };
        CrossCheck: {
            /** @description An opaque identifier. */
            id: string;
            /** @description An opaque identifier. */
            caseId: string;
            caseVersion: number;
            /** @description The engine the lattice side ran with. */
            engineVersion: string;
            paths: number;
            seed: number;
            /** @enum {string} */
            status: "running" | "done" | "failed" | "cancelled";
            progress: number;
            result: components["schemas"]["CrossCheckResult"] | null;
            error: string | null;
            /**
             * Format: date-time
             * @description An ISO 8601 instant (UTC).
             */
            createdAt: string;
            finishedAt: string | null;
        };
        CrossCheckResult: {
            lattice: {
                /** @description An amount in the project's currency and units. */
                expandedNpv: number;
                /** @description The convergence band (docs/engine.md §5). */
                band: {
                    /** @description An amount in the project's currency and units. */
                    low: number;
                    /** @description An amount in the project's currency and units. */
                    high: number;
                } | null;
                steps: number;
                engineVersion: string;
                rights: {
                    id: string;
                    exerciseProbability: number;
                }[];
            };
            monteCarlo: {
                paths: number;
                seed: number;
                dates: number;
                /** @description The fitted rule on independent paths: biased down. */
                lowBiased: {
                    /** @description An amount in the project's currency and units. */
                    expandedNpv: number;
                    /** @description An amount in the project's currency and units. */
                    standardError: number;
                };
                /** @description The fitted rule on the paths it was fitted to: biased up. */
                highBiased: {
                    /** @description An amount in the project's currency and units. */
                    expandedNpv: number;
                    /** @description An amount in the project's currency and units. */
                    standardError: number;
                };
                rights: {
                    id: string;
                    probability: number;
                    standardError: number;
                }[];
            };
            verdict: {
                agrees: boolean;
                /** @description [low − 3·SE, high + 3·SE]. */
                monteCarloRange: {
                    /** @description An amount in the project's currency and units. */
                    low: number;
                    /** @description An amount in the project's currency and units. */
                    high: number;
                };
                latticeRange: {
                    /** @description An amount in the project's currency and units. */
                    low: number;
                    /** @description An amount in the project's currency and units. */
                    high: number;
                };
                /** @description How far apart the two ranges are; 0 when they meet. */
                gap: number;
                /** @description The lattice's value less the middle of the two estimates. */
                difference: number;
                rights: {
                    id: string;
                    lattice: number;
                    monteCarlo: number;
                    standardError: number;
                    differs: boolean;
                }[];
            };
            seconds: number;
        };
        ComparisonRow: {
            /** @enum {string} */
            group: "Valuation" | "Rights" | "Assumptions" | "Cash flows";
            label: string;
            /** @description Formatted for people, one per case; null where a case has no such value. */
            values: (string | null)[];
            /** @description The raw numbers where the row is numeric. */
            numbers?: (number | null)[];
            differs: boolean;
        };
        /** @description A submitted version, frozen: its inputs, figures and decision. */
        Snapshot: {
            /** @description An opaque identifier. */
            id: string;
            /** @description An opaque identifier. */
            caseId: string;
            caseVersion: number;
            caseName: string;
            /** @enum {string} */
            status: "in_review" | "approved" | "returned" | "withdrawn";
            engineVersion: string;
            inputHash: string;
            /**
             * Format: date-time
             * @description An ISO 8601 instant (UTC).
             */
            submittedAt: string;
            decidedAt: string | null;
            decisionReason: string | null;
            recommendation: string | null;
        };
        Comment: {
            /** @description An opaque identifier. */
            id: string;
            section: string;
            body: string;
            /** @description A person, or an API key as "API key <name> (created by …)"; null when deleted. */
            author: string | null;
            /**
             * Format: date-time
             * @description An ISO 8601 instant (UTC).
             */
            createdAt: string;
            snapshotId?: string | null;
        };
        ReviewQueueItem: {
            /** @description An opaque identifier. */
            caseId: string;
            caseName: string;
            /** @enum {string} */
            status: "draft" | "in_review" | "approved" | "returned";
            /** @description An opaque identifier. */
            projectId: string;
            projectName: string;
            currency: string;
            /** @description An opaque identifier. */
            snapshotId: string;
            /**
             * Format: date-time
             * @description An ISO 8601 instant (UTC).
             */
            submittedAt: string;
            decidedAt: string | null;
            /** @description A person, or an API key as "API key <name> (created by …)"; null when deleted. */
            submittedBy: string | null;
            /** @description An amount in the project's currency and units. */
            staticNpv: number;
            /** @description An amount in the project's currency and units. */
            optionPremium: number;
            /** @description An amount in the project's currency and units. */
            expandedNpv: number;
        };
        Watch: {
            followed: {
                /** @description An opaque identifier. */
                snapshotId: string;
                caseVersion: number;
                /** @description YYYY-MM-DD: the approval of the version followed. */
                valuationDate: string;
                /** @description Years after the valuation date. */
                horizon: number;
                /** @description V at the valuation date. */
                value: number;
                /** @description The approved version this one replaced as the model followed (its decisions stay on its record). */
                replaces: {
                    caseVersion: number;
                    approvedOn: string;
                } | null;
            };
            /** @description The approved rights with their boundaries (years after the valuation date), for charts. */
            boundaries: {
                id: string;
                kind: string;
                exerciseProbability: number;
                boundary: {
                    t: number;
                    critical: number | null;
                    /** @enum {string} */
                    side: "above" | "below" | "between" | "anywhere";
                    low: number | null;
                    high: number | null;
                }[];
            }[];
            /** @description YYYY-MM-DD: today, the date the rights are read at (the clock has moved since approval). */
            asOf: string;
            /** @description The project value V: the latest observed, or V at the valuation date. */
            value: number;
            /** @description YYYY-MM-DD: when that value was observed (the valuation date before any observation). */
            valueOn: string;
            rights: {
                id: string;
                name: string;
                /** @enum {string} */
                status: "in_region" | "near" | "outside" | "window_not_open" | "window_closed" | "exercised" | "declined";
                critical: number | null;
                side: ("above" | "below" | "between" | "anywhere") | null;
                /** @description critical ÷ V − 1. */
                distanceRatio: number | null;
                /** @description ln(critical ÷ V) ÷ σ: standard deviations of ln V over a year. */
                distanceSd: number | null;
                windowOpensAt: string | null;
                windowClosesAt: string | null;
            }[];
            observations: {
                /** @description An opaque identifier. */
                id: string;
                observedOn: string;
                /** @description An amount in the project's currency and units. */
                value: number;
                note: string;
                source: string;
                /**
                 * Format: date-time
                 * @description An ISO 8601 instant (UTC).
                 */
                recordedAt: string;
                /** @description A person, or an API key as "API key <name> (created by …)"; null when deleted. */
                recordedBy: string | null;
            }[];
            decisions: {
                /** @description An opaque identifier. */
                id: string;
                rightId: string;
                /** @enum {string} */
                decision: "exercised" | "declined" | "postponed";
                decidedOn: string;
                reason: string;
                /**
                 * Format: date-time
                 * @description An ISO 8601 instant (UTC).
                 */
                recordedAt: string;
                /** @description A person, or an API key as "API key <name> (created by …)"; null when deleted. */
                recordedBy: string | null;
            }[];
            /** @description The alerts raised on this case, newest first (at most 50). */
            alerts: {
                /** @description An opaque identifier. */
                id: string;
                /** @enum {string} */
                kind: "in_region" | "near" | "window_opened" | "window_closing";
                rightId: string;
                message: string;
                asOf: string;
                /**
                 * Format: date-time
                 * @description An ISO 8601 instant (UTC).
                 */
                createdAt: string;
                /** @description An opaque identifier. */
                caseId: string;
                caseName: string;
                /** @description An opaque identifier. */
                projectId: string;
                projectName: string;
            }[];
            /** @description The approved model re-valued from that date with V, starting in the mode the recorded decisions made. */
            revaluedExpandedNpv: number | null;
        };
        Attachment: {
            /** @description An opaque identifier. */
            id: string;
            filename: string;
            /** @enum {string} */
            kind: "pdf" | "xlsx" | "csv" | "png";
            /** @description Bytes. */
            size: number;
            /** @description A person, or an API key as "API key <name> (created by …)"; null when deleted. */
            uploadedBy: string | null;
            /**
             * Format: date-time
             * @description An ISO 8601 instant (UTC).
             */
            uploadedAt: string;
        };
        /** @description Two to four cases side by side, one row per input or figure. */
        Comparison: {
            cases: {
                /** @description An opaque identifier. */
                id: string;
                /** @description An opaque identifier. */
                projectId: string;
                projectName: string;
                caseName: string;
                currency: string;
                /** @enum {string} */
                status: "draft" | "in_review" | "approved" | "returned";
                valuedAt: string | null;
                /** @description The case version the figures are of. */
                figuresVersion: number | null;
                version: number;
                /** @description The engine that computed the figures (docs/engine.md); null when not valued yet. */
                engineVersion: string | null;
                staticNpv: number | null;
                optionPremium: number | null;
                expandedNpv: number | null;
            }[];
            rows: components["schemas"]["ComparisonRow"][];
        };
        HistoryEstimate: {
            source: string;
            /** @description Annualised, as a fraction. */
            volatility: number;
            interval: [
                number,
                number
            ];
            confidence: number;
            observations: number;
            warnings: string[];
        } & {
            [key: string]: unknown;
        };
        VolatilitySimulation: {
            /** @description An opaque identifier. */
            id: string;
            /** @description An opaque identifier. */
            caseId: string;
            /** @enum {string} */
            status: "running" | "done" | "failed" | "cancelled";
            progress: number | null;
            spec: unknown;
            result: unknown | null;
            error: string | null;
            /**
             * Format: date-time
             * @description An ISO 8601 instant (UTC).
             */
            createdAt: string;
            finishedAt: string | null;
        };
        PortfolioRevaluation: {
            /** @description An opaque identifier. */
            id: string;
            /** @enum {string} */
            status: "running" | "done" | "failed";
            total: number | null;
            done: number;
            failed: number;
            error: string | null;
            /**
             * Format: date-time
             * @description An ISO 8601 instant (UTC).
             */
            createdAt: string;
            finishedAt: string | null;
        };
        /** @description The organisation's defaults for new projects and cases. */
        Settings: {
            currency: string;
            /** @description Continuously compounded, as a fraction a year. */
            riskFreeRate: number;
            /** @description As a fraction a year. */
            wacc: number;
            fiscalYearStartMonth: number;
            /** @description How many days before a followed right's window closes its alert goes out. */
            alertDaysBeforeClose: number;
        };
        ApiKey: {
            /** @description An opaque identifier. */
            id: string;
            name: string;
            /** @enum {string} */
            role: "analyst" | "reviewer" | "viewer";
            /** @description The first characters of the key, to tell keys apart. */
            prefix: string;
            /**
             * Format: date-time
             * @description An ISO 8601 instant (UTC).
             */
            createdAt: string;
            createdBy: string | null;
            expiresAt: string | null;
            lastUsedAt: string | null;
            revokedAt: string | null;
        };
        ApiKeyCreated: {
            /** @description An opaque identifier. */
            id: string;
            name: string;
            /** @enum {string} */
            role: "analyst" | "reviewer" | "viewer";
            prefix: string;
            /** @description The secret, shown this once: Leeway keeps only its hash. */
            key: string;
            /**
             * Format: date-time
             * @description An ISO 8601 instant (UTC).
             */
            createdAt: string;
            expiresAt: string | null;
        };
    };
    responses: never;
    parameters: never;
    requestBodies: never;
    headers: never;
    pathItems: never;
}
export type $defs = Record<string, never>;
export interface operations {
    listProjects: {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description The organisation's projects, by name. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": {
                        projects: components["schemas"]["ProjectSummary"][];
                    };
                };
            };
            /** @description No session and no API key, or a key that is wrong, revoked or expired. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The caller's role does not allow this. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Too many requests from this key, or too many estimates at once; see Retry-After. */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Any other error, in the same shape. */
            default: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
        };
    };
    createProject: {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": {
                    name: string;
                    /** @default  */
                    description?: string;
                    currency?: string;
                };
            };
        };
        responses: {
            /** @description The project. */
            201: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": {
                        project: components["schemas"]["Project"];
                    };
                };
            };
            /** @description No session and no API key, or a key that is wrong, revoked or expired. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The caller's role does not allow this. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The input is not valid; `fields` says where. */
            422: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Too many requests from this key, or too many estimates at once; see Retry-After. */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Any other error, in the same shape. */
            default: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
        };
    };
    getProject: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                /** @description An id from an earlier answer. */
                projectId: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description The project. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": {
                        project: components["schemas"]["Project"];
                    };
                };
            };
            /** @description No session and no API key, or a key that is wrong, revoked or expired. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The caller's role does not allow this. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description No such record in the caller's organisation. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Too many requests from this key, or too many estimates at once; see Retry-After. */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Any other error, in the same shape. */
            default: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
        };
    };
    deleteProject: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                /** @description An id from an earlier answer. */
                projectId: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description Deleted. */
            204: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
            /** @description No session and no API key, or a key that is wrong, revoked or expired. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The caller's role does not allow this. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description No such record in the caller's organisation. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Too many requests from this key, or too many estimates at once; see Retry-After. */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Any other error, in the same shape. */
            default: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
        };
    };
    updateProject: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                /** @description An id from an earlier answer. */
                projectId: string;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": {
                    name?: string;
                    description?: string;
                    /** @enum {string} */
                    status?: "active" | "archived";
                };
            };
        };
        responses: {
            /** @description The project as saved. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": {
                        project: components["schemas"]["Project"];
                    };
                };
            };
            /** @description No session and no API key, or a key that is wrong, revoked or expired. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The caller's role does not allow this. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description No such record in the caller's organisation. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The input is not valid; `fields` says where. */
            422: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Too many requests from this key, or too many estimates at once; see Retry-After. */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Any other error, in the same shape. */
            default: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
        };
    };
    listProjectActivity: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                /** @description An id from an earlier answer. */
                projectId: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description The last 30 entries. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": {
                        activity: components["schemas"]["ActivityEntry"][];
                    };
                };
            };
            /** @description No session and no API key, or a key that is wrong, revoked or expired. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The caller's role does not allow this. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description No such record in the caller's organisation. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Too many requests from this key, or too many estimates at once; see Retry-After. */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Any other error, in the same shape. */
            default: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
        };
    };
    listProjectCases: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                /** @description An id from an earlier answer. */
                projectId: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description The cases, oldest first. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": {
                        cases: {
                            /** @description An opaque identifier. */
                            id: string;
                            /** @description An opaque identifier. */
                            projectId: string;
                            name: string;
                            /** @description Send it back with an edit: an edit based on an older version is refused (409). */
                            version: number;
                            /** @enum {string} */
                            status: "draft" | "in_review" | "approved" | "returned";
                            cashFlows: {
                                rows: {
                                    year: number;
                                    revenue: number;
                                    operatingCost: number;
                                    capex: number;
                                    tax: number;
                                    workingCapital: number;
                                }[];
                                wacc: number;
                                /**
                                 * @default end-of-year
                                 * @enum {string}
                                 */
                                timing: "end-of-year" | "mid-year";
                            };
                            settings: {
                                volatility: number;
                                riskFreeRate: number;
                                steps: number;
                                /**
                                 * @default crr
                                 * @enum {string}
                                 */
                                tree: "crr" | "jarrow-rudd" | "tian" | "trigeorgis";
                                volatilitySource?: {
                                    /** @enum {string} */
                                    method: "direct" | "history" | "monte-carlo";
                                    note: string;
                                };
                            };
                            options: ({
                                /** @constant */
                                kind: "expand";
                                id?: string;
                                factor: number;
                                cost: number | {
                                    amount: number;
                                    growth: number;
                                } | {
                                    from: number;
                                    amount: number;
                                }[];
                                window: {
                                    /** @constant */
                                    kind: "american";
                                    from: number;
                                    to: number;
                                } | {
                                    /** @constant */
                                    kind: "bermudan";
                                    dates: number[];
                                } | {
                                    /** @constant */
                                    kind: "european";
                                    at: number;
                                };
                            } | {
                                /** @constant */
                                kind: "contract";
                                id?: string;
                                fraction: number;
                                savings: number | {
                                    amount: number;
                                    growth: number;
                                } | {
                                    from: number;
                                    amount: number;
                                }[];
                                window: {
                                    /** @constant */
                                    kind: "american";
                                    from: number;
                                    to: number;
                                } | {
                                    /** @constant */
                                    kind: "bermudan";
                                    dates: number[];
                                } | {
                                    /** @constant */
                                    kind: "european";
                                    at: number;
                                };
                            } | {
                                /** @constant */
                                kind: "abandon";
                                id?: string;
                                salvage: number | {
                                    amount: number;
                                    growth: number;
                                } | {
                                    from: number;
                                    amount: number;
                                }[];
                                fixedSalvage?: boolean;
                                window: {
                                    /** @constant */
                                    kind: "american";
                                    from: number;
                                    to: number;
                                } | {
                                    /** @constant */
                                    kind: "bermudan";
                                    dates: number[];
                                } | {
                                    /** @constant */
                                    kind: "european";
                                    at: number;
                                };
                            } | {
                                /** @constant */
                                kind: "defer";
                                id?: string;
                                cost: number | {
                                    amount: number;
                                    growth: number;
                                } | {
                                    from: number;
                                    amount: number;
                                }[];
                                window: {
                                    /** @constant */
                                    kind: "american";
                                    from: number;
                                    to: number;
                                } | {
                                    /** @constant */
                                    kind: "bermudan";
                                    dates: number[];
                                } | {
                                    /** @constant */
                                    kind: "european";
                                    at: number;
                                };
                            } | {
                                /** @constant */
                                kind: "stage";
                                id?: string;
                                payments: {
                                    at: number;
                                    amount: number;
                                }[];
                            } | {
                                /** @constant */
                                kind: "mothball";
                                id?: string;
                                toScale: number;
                                cost: number | {
                                    amount: number;
                                    growth: number;
                                } | {
                                    from: number;
                                    amount: number;
                                }[];
                                backCost: number | {
                                    amount: number;
                                    growth: number;
                                } | {
                                    from: number;
                                    amount: number;
                                }[];
                                flowPerYear?: number;
                                window?: {
                                    /** @constant */
                                    kind: "american";
                                    from: number;
                                    to: number;
                                } | {
                                    /** @constant */
                                    kind: "bermudan";
                                    dates: number[];
                                } | {
                                    /** @constant */
                                    kind: "european";
                                    at: number;
                                };
                            })[];
                            /**
                             * Format: date-time
                             * @description An ISO 8601 instant (UTC).
                             */
                            createdAt: string;
                            /**
                             * Format: date-time
                             * @description An ISO 8601 instant (UTC).
                             */
                            updatedAt: string;
                            latest: components["schemas"]["Headline"] | null;
                        }[];
                    };
                };
            };
            /** @description No session and no API key, or a key that is wrong, revoked or expired. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The caller's role does not allow this. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description No such record in the caller's organisation. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Too many requests from this key, or too many estimates at once; see Retry-After. */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Any other error, in the same shape. */
            default: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
        };
    };
    createCase: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                /** @description An id from an earlier answer. */
                projectId: string;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": {
                    name: string;
                    cashFlows: {
                        rows: {
                            year: number;
                            revenue: number;
                            operatingCost: number;
                            capex: number;
                            tax: number;
                            workingCapital: number;
                        }[];
                        wacc: number;
                        /**
                         * @default end-of-year
                         * @enum {string}
                         */
                        timing?: "end-of-year" | "mid-year";
                    };
                    settings: {
                        volatility: number;
                        riskFreeRate: number;
                        steps: number;
                        /**
                         * @default crr
                         * @enum {string}
                         */
                        tree?: "crr" | "jarrow-rudd" | "tian" | "trigeorgis";
                        volatilitySource?: {
                            /** @enum {string} */
                            method: "direct" | "history" | "monte-carlo";
                            note: string;
                        };
                    };
                    /** @default [] */
                    options?: ({
                        /** @constant */
                        kind: "expand";
                        id?: string;
                        factor: number;
                        cost: number | {
                            amount: number;
                            growth: number;
                        } | {
                            from: number;
                            amount: number;
                        }[];
                        window: {
                            /** @constant */
                            kind: "american";
                            from: number;
                            to: number;
                        } | {
                            /** @constant */
                            kind: "bermudan";
                            dates: number[];
                        } | {
                            /** @constant */
                            kind: "european";
                            at: number;
                        };
                    } | {
                        /** @constant */
                        kind: "contract";
                        id?: string;
                        fraction: number;
                        savings: number | {
                            amount: number;
                            growth: number;
                        } | {
                            from: number;
                            amount: number;
                        }[];
                        window: {
                            /** @constant */
                            kind: "american";
                            from: number;
                            to: number;
                        } | {
                            /** @constant */
                            kind: "bermudan";
                            dates: number[];
                        } | {
                            /** @constant */
                            kind: "european";
                            at: number;
                        };
                    } | {
                        /** @constant */
                        kind: "abandon";
                        id?: string;
                        salvage: number | {
                            amount: number;
                            growth: number;
                        } | {
                            from: number;
                            amount: number;
                        }[];
                        fixedSalvage?: boolean;
                        window: {
                            /** @constant */
                            kind: "american";
                            from: number;
                            to: number;
                        } | {
                            /** @constant */
                            kind: "bermudan";
                            dates: number[];
                        } | {
                            /** @constant */
                            kind: "european";
                            at: number;
                        };
                    } | {
                        /** @constant */
                        kind: "defer";
                        id?: string;
                        cost: number | {
                            amount: number;
                            growth: number;
                        } | {
                            from: number;
                            amount: number;
                        }[];
                        window: {
                            /** @constant */
                            kind: "american";
                            from: number;
                            to: number;
                        } | {
                            /** @constant */
                            kind: "bermudan";
                            dates: number[];
                        } | {
                            /** @constant */
                            kind: "european";
                            at: number;
                        };
                    } | {
                        /** @constant */
                        kind: "stage";
                        id?: string;
                        payments: {
                            at: number;
                            amount: number;
                        }[];
                    } | {
                        /** @constant */
                        kind: "mothball";
                        id?: string;
                        toScale: number;
                        cost: number | {
                            amount: number;
                            growth: number;
                        } | {
                            from: number;
                            amount: number;
                        }[];
                        backCost: number | {
                            amount: number;
                            growth: number;
                        } | {
                            from: number;
                            amount: number;
                        }[];
                        flowPerYear?: number;
                        window?: {
                            /** @constant */
                            kind: "american";
                            from: number;
                            to: number;
                        } | {
                            /** @constant */
                            kind: "bermudan";
                            dates: number[];
                        } | {
                            /** @constant */
                            kind: "european";
                            at: number;
                        };
                    })[];
                };
            };
        };
        responses: {
            /** @description The case, at version 1. */
            201: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": {
                        case: components["schemas"]["Case"];
                    };
                };
            };
            /** @description No session and no API key, or a key that is wrong, revoked or expired. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The caller's role does not allow this. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description No such record in the caller's organisation. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The input is not valid; `fields` says where. */
            422: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Too many requests from this key, or too many estimates at once; see Retry-After. */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Any other error, in the same shape. */
            default: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
        };
    };
    listCases: {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description The cases. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": {
                        cases: {
                            id: string;
                            name: string;
                            /** @enum {string} */
                            status: "draft" | "in_review" | "approved" | "returned";
                            projectId: string;
                            projectName: string;
                        }[];
                    };
                };
            };
            /** @description No session and no API key, or a key that is wrong, revoked or expired. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The caller's role does not allow this. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Too many requests from this key, or too many estimates at once; see Retry-After. */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Any other error, in the same shape. */
            default: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
        };
    };
    getCase: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                /** @description An id from an earlier answer. */
                caseId: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description The case. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": {
                        case: components["schemas"]["Case"];
                    };
                };
            };
            /** @description No session and no API key, or a key that is wrong, revoked or expired. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The caller's role does not allow this. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description No such record in the caller's organisation. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Too many requests from this key, or too many estimates at once; see Retry-After. */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Any other error, in the same shape. */
            default: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
        };
    };
    deleteCase: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                /** @description An id from an earlier answer. */
                caseId: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description Deleted. */
            204: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
            /** @description No session and no API key, or a key that is wrong, revoked or expired. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The caller's role does not allow this. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description No such record in the caller's organisation. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Too many requests from this key, or too many estimates at once; see Retry-After. */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Any other error, in the same shape. */
            default: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
        };
    };
    updateCase: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                /** @description An id from an earlier answer. */
                caseId: string;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": {
                    name: string;
                    cashFlows: {
                        rows: {
                            year: number;
                            revenue: number;
                            operatingCost: number;
                            capex: number;
                            tax: number;
                            workingCapital: number;
                        }[];
                        wacc: number;
                        /**
                         * @default end-of-year
                         * @enum {string}
                         */
                        timing?: "end-of-year" | "mid-year";
                    };
                    settings: {
                        volatility: number;
                        riskFreeRate: number;
                        steps: number;
                        /**
                         * @default crr
                         * @enum {string}
                         */
                        tree?: "crr" | "jarrow-rudd" | "tian" | "trigeorgis";
                        volatilitySource?: {
                            /** @enum {string} */
                            method: "direct" | "history" | "monte-carlo";
                            note: string;
                        };
                    };
                    /** @default [] */
                    options?: ({
                        /** @constant */
                        kind: "expand";
                        id?: string;
                        factor: number;
                        cost: number | {
                            amount: number;
                            growth: number;
                        } | {
                            from: number;
                            amount: number;
                        }[];
                        window: {
                            /** @constant */
                            kind: "american";
                            from: number;
                            to: number;
                        } | {
                            /** @constant */
                            kind: "bermudan";
                            dates: number[];
                        } | {
                            /** @constant */
                            kind: "european";
                            at: number;
                        };
                    } | {
                        /** @constant */
                        kind: "contract";
                        id?: string;
                        fraction: number;
                        savings: number | {
                            amount: number;
                            growth: number;
                        } | {
                            from: number;
                            amount: number;
                        }[];
                        window: {
                            /** @constant */
                            kind: "american";
                            from: number;
                            to: number;
                        } | {
                            /** @constant */
                            kind: "bermudan";
                            dates: number[];
                        } | {
                            /** @constant */
                            kind: "european";
                            at: number;
                        };
                    } | {
                        /** @constant */
                        kind: "abandon";
                        id?: string;
                        salvage: number | {
                            amount: number;
                            growth: number;
                        } | {
                            from: number;
                            amount: number;
                        }[];
                        fixedSalvage?: boolean;
                        window: {
                            /** @constant */
                            kind: "american";
                            from: number;
                            to: number;
                        } | {
                            /** @constant */
                            kind: "bermudan";
                            dates: number[];
                        } | {
                            /** @constant */
                            kind: "european";
                            at: number;
                        };
                    } | {
                        /** @constant */
                        kind: "defer";
                        id?: string;
                        cost: number | {
                            amount: number;
                            growth: number;
                        } | {
                            from: number;
                            amount: number;
                        }[];
                        window: {
                            /** @constant */
                            kind: "american";
                            from: number;
                            to: number;
                        } | {
                            /** @constant */
                            kind: "bermudan";
                            dates: number[];
                        } | {
                            /** @constant */
                            kind: "european";
                            at: number;
                        };
                    } | {
                        /** @constant */
                        kind: "stage";
                        id?: string;
                        payments: {
                            at: number;
                            amount: number;
                        }[];
                    } | {
                        /** @constant */
                        kind: "mothball";
                        id?: string;
                        toScale: number;
                        cost: number | {
                            amount: number;
                            growth: number;
                        } | {
                            from: number;
                            amount: number;
                        }[];
                        backCost: number | {
                            amount: number;
                            growth: number;
                        } | {
                            from: number;
                            amount: number;
                        }[];
                        flowPerYear?: number;
                        window?: {
                            /** @constant */
                            kind: "american";
                            from: number;
                            to: number;
                        } | {
                            /** @constant */
                            kind: "bermudan";
                            dates: number[];
                        } | {
                            /** @constant */
                            kind: "european";
                            at: number;
                        };
                    })[];
                    version: number;
                };
            };
        };
        responses: {
            /** @description The case, one version later. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": {
                        case: components["schemas"]["Case"];
                    };
                };
            };
            /** @description No session and no API key, or a key that is wrong, revoked or expired. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The caller's role does not allow this. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description No such record in the caller's organisation. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The input is not valid; `fields` says where. */
            422: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Too many requests from this key, or too many estimates at once; see Retry-After. */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Any other error, in the same shape. */
            default: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
        };
    };
    duplicateCase: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                /** @description An id from an earlier answer. */
                caseId: string;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": {
                    name: string;
                };
            };
        };
        responses: {
            /** @description The copy, a draft. */
            201: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": {
                        case: components["schemas"]["Case"];
                    };
                };
            };
            /** @description No session and no API key, or a key that is wrong, revoked or expired. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The caller's role does not allow this. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description No such record in the caller's organisation. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The input is not valid; `fields` says where. */
            422: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Too many requests from this key, or too many estimates at once; see Retry-After. */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Any other error, in the same shape. */
            default: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
        };
    };
    reviseCase: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                /** @description An id from an earlier answer. */
                caseId: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description The case, a draft again at the next version. */
            201: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": {
                        case: components["schemas"]["Case"];
                    };
                };
            };
            /** @description No session and no API key, or a key that is wrong, revoked or expired. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The caller's role does not allow this. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description No such record in the caller's organisation. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Too many requests from this key, or too many estimates at once; see Retry-After. */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Any other error, in the same shape. */
            default: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
        };
    };
    importCashFlows: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                /** @description An id from an earlier answer. */
                caseId: string;
            };
            cookie?: never;
        };
        /** @description The workbook (file), and to import: confirm=true and version. */
        requestBody: {
            content: {
                "multipart/form-data": {
                    /** Format: binary */
                    file: string;
                    /** @enum {string} */
                    confirm?: "true" | "false";
                    version?: string;
                };
            };
        };
        responses: {
            /** @description A preview, or the case as saved. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": {
                        preview: {
                            cashFlows: {
                                [key: string]: unknown;
                            };
                            analysis: {
                                [key: string]: unknown;
                            };
                        };
                    } | {
                        case: components["schemas"]["Case"];
                    };
                };
            };
            /** @description No session and no API key, or a key that is wrong, revoked or expired. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The caller's role does not allow this. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description No such record in the caller's organisation. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The input is not valid; `fields` says where. */
            422: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Too many requests from this key, or too many estimates at once; see Retry-After. */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Any other error, in the same shape. */
            default: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
        };
    };
    exportCase: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                /** @description An id from an earlier answer. */
                caseId: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description The workbook. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/vnd.openxmlformats-officedocument.spreadsheetml.sheet": string;
                };
            };
            /** @description No session and no API key, or a key that is wrong, revoked or expired. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The caller's role does not allow this. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description No such record in the caller's organisation. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Too many requests from this key, or too many estimates at once; see Retry-After. */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Any other error, in the same shape. */
            default: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
        };
    };
    listCaseValuations: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                /** @description An id from an earlier answer. */
                caseId: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description The runs, in figures. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": {
                        runs: components["schemas"]["ValuationRunSummary"][];
                    };
                };
            };
            /** @description No session and no API key, or a key that is wrong, revoked or expired. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The caller's role does not allow this. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description No such record in the caller's organisation. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Too many requests from this key, or too many estimates at once; see Retry-After. */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Any other error, in the same shape. */
            default: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
        };
    };
    valueCase: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                /** @description An id from an earlier answer. */
                caseId: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description The stored run: the model valued and its result. */
            201: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": {
                        run: components["schemas"]["ValuationRun"];
                    };
                };
            };
            /** @description No session and no API key, or a key that is wrong, revoked or expired. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The caller's role does not allow this. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description No such record in the caller's organisation. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Too many requests from this key, or too many estimates at once; see Retry-After. */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Any other error, in the same shape. */
            default: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
        };
    };
    rerunValuation: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                /** @description An id from an earlier answer. */
                caseId: string;
                /** @description An id from an earlier answer. */
                runId: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description Whether the run reproduces, and what moved. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["RerunOutcome"];
                };
            };
            /** @description No session and no API key, or a key that is wrong, revoked or expired. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The caller's role does not allow this. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description No such record in the caller's organisation. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Too many requests from this key, or too many estimates at once; see Retry-After. */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Any other error, in the same shape. */
            default: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
        };
    };
    listCrossChecks: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                /** @description An id from an earlier answer. */
                caseId: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description Up to 20 cross-checks. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": {
                        crossChecks: components["schemas"]["CrossCheck"][];
                    };
                };
            };
            /** @description No session and no API key, or a key that is wrong, revoked or expired. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The caller's role does not allow this. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description No such record in the caller's organisation. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Too many requests from this key, or too many estimates at once; see Retry-After. */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Any other error, in the same shape. */
            default: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
        };
    };
    startCrossCheck: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                /** @description An id from an earlier answer. */
                caseId: string;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": {
                    /** @description Paths in each pass (fitting and checking), 1000–200000; 20000 when omitted. */
                    paths?: number;
                    /** @description The same seed, paths and model give the same answer; chosen at random when omitted (and stored). */
                    seed?: number;
                };
            };
        };
        responses: {
            /** @description Started: follow it by its id. */
            202: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": {
                        /** @description An opaque identifier. */
                        id: string;
                        /** @constant */
                        status: "running";
                    };
                };
            };
            /** @description No session and no API key, or a key that is wrong, revoked or expired. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The caller's role does not allow this. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description No such record in the caller's organisation. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The input is not valid; `fields` says where. */
            422: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Too many requests from this key, or too many estimates at once; see Retry-After. */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Any other error, in the same shape. */
            default: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
        };
    };
    getCrossCheck: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                /** @description An id from an earlier answer. */
                caseId: string;
                /** @description An id from an earlier answer. */
                crossCheckId: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description The cross-check. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["CrossCheck"];
                };
            };
            /** @description No session and no API key, or a key that is wrong, revoked or expired. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The caller's role does not allow this. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description No such record in the caller's organisation. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Too many requests from this key, or too many estimates at once; see Retry-After. */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Any other error, in the same shape. */
            default: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
        };
    };
    cancelCrossCheck: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                /** @description An id from an earlier answer. */
                caseId: string;
                /** @description An id from an earlier answer. */
                crossCheckId: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description Cancelled. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": {
                        id: string;
                        /** @constant */
                        status: "cancelled";
                    };
                };
            };
            /** @description No session and no API key, or a key that is wrong, revoked or expired. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The caller's role does not allow this. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description No such record in the caller's organisation. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Too many requests from this key, or too many estimates at once; see Retry-After. */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Any other error, in the same shape. */
            default: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
        };
    };
    valueModel: {
        parameters: {
            query?: {
                /** @description false: one lattice pass, no extras. */
                extras?: "true" | "false";
                /** @description true: each right's boundary from every mode it can be used from (rights[].paths). */
                paths?: "true" | "false";
            };
            header?: never;
            path?: never;
            cookie?: never;
        };
        /** @description An engine model. */
        requestBody: {
            content: {
                "application/json": {
                    underlying: {
                        value: number;
                        volatility: number;
                        payoutYield?: number;
                        payouts?: {
                            at: number;
                            fraction: number;
                        }[];
                        payoutPeriods?: {
                            from: number;
                            to: number;
                            fraction: number;
                        }[];
                    };
                    riskFreeRate: number;
                    horizon: number;
                    steps: number;
                    /** @enum {string} */
                    tree?: "crr" | "jarrow-rudd" | "tian" | "trigeorgis";
                    investment?: number;
                    modes?: {
                        id: string;
                        scale: number;
                        flowPerYear?: number;
                        terminal?: number;
                    }[];
                    start?: string;
                    switches?: {
                        id: string;
                        from: string[];
                        to: string;
                        cost: number | {
                            amount: number;
                            growth: number;
                        } | {
                            from: number;
                            amount: number;
                        }[];
                        window: {
                            /** @constant */
                            kind: "american";
                            from: number;
                            to: number;
                        } | {
                            /** @constant */
                            kind: "bermudan";
                            dates: number[];
                        } | {
                            /** @constant */
                            kind: "european";
                            at: number;
                        };
                    }[];
                    options?: ({
                        /** @constant */
                        kind: "expand";
                        id?: string;
                        factor: number;
                        cost: number | {
                            amount: number;
                            growth: number;
                        } | {
                            from: number;
                            amount: number;
                        }[];
                        window: {
                            /** @constant */
                            kind: "american";
                            from: number;
                            to: number;
                        } | {
                            /** @constant */
                            kind: "bermudan";
                            dates: number[];
                        } | {
                            /** @constant */
                            kind: "european";
                            at: number;
                        };
                    } | {
                        /** @constant */
                        kind: "contract";
                        id?: string;
                        fraction: number;
                        savings: number | {
                            amount: number;
                            growth: number;
                        } | {
                            from: number;
                            amount: number;
                        }[];
                        window: {
                            /** @constant */
                            kind: "american";
                            from: number;
                            to: number;
                        } | {
                            /** @constant */
                            kind: "bermudan";
                            dates: number[];
                        } | {
                            /** @constant */
                            kind: "european";
                            at: number;
                        };
                    } | {
                        /** @constant */
                        kind: "abandon";
                        id?: string;
                        salvage: number | {
                            amount: number;
                            growth: number;
                        } | {
                            from: number;
                            amount: number;
                        }[];
                        fixedSalvage?: boolean;
                        window: {
                            /** @constant */
                            kind: "american";
                            from: number;
                            to: number;
                        } | {
                            /** @constant */
                            kind: "bermudan";
                            dates: number[];
                        } | {
                            /** @constant */
                            kind: "european";
                            at: number;
                        };
                    } | {
                        /** @constant */
                        kind: "defer";
                        id?: string;
                        cost: number | {
                            amount: number;
                            growth: number;
                        } | {
                            from: number;
                            amount: number;
                        }[];
                        window: {
                            /** @constant */
                            kind: "american";
                            from: number;
                            to: number;
                        } | {
                            /** @constant */
                            kind: "bermudan";
                            dates: number[];
                        } | {
                            /** @constant */
                            kind: "european";
                            at: number;
                        };
                    } | {
                        /** @constant */
                        kind: "stage";
                        id?: string;
                        payments: {
                            at: number;
                            amount: number;
                        }[];
                    } | {
                        /** @constant */
                        kind: "mothball";
                        id?: string;
                        toScale: number;
                        cost: number | {
                            amount: number;
                            growth: number;
                        } | {
                            from: number;
                            amount: number;
                        }[];
                        backCost: number | {
                            amount: number;
                            growth: number;
                        } | {
                            from: number;
                            amount: number;
                        }[];
                        flowPerYear?: number;
                        window?: {
                            /** @constant */
                            kind: "american";
                            from: number;
                            to: number;
                        } | {
                            /** @constant */
                            kind: "bermudan";
                            dates: number[];
                        } | {
                            /** @constant */
                            kind: "european";
                            at: number;
                        };
                    })[];
                    exercised?: string[];
                };
            };
        };
        responses: {
            /** @description The result. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ValuationResult"];
                };
            };
            /** @description No session and no API key, or a key that is wrong, revoked or expired. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The caller's role does not allow this. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The input is not valid; `fields` says where. */
            422: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Too many requests from this key, or too many estimates at once; see Retry-After. */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Any other error, in the same shape. */
            default: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
        };
    };
    listSnapshots: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                /** @description An id from an earlier answer. */
                caseId: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description The status, what changed for reviewers, and the snapshots. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": {
                        /** @enum {string} */
                        status: "draft" | "in_review" | "approved" | "returned";
                        /** @description For a version in review: what changed since the version last returned, or the approved version it equals. */
                        changes: {
                            sinceReturned: {
                                caseVersion: number;
                                /**
                                 * Format: date-time
                                 * @description An ISO 8601 instant (UTC).
                                 */
                                decidedAt: string;
                                rows: components["schemas"]["ComparisonRow"][];
                            } | null;
                            sameAsApproved: {
                                caseVersion: number;
                                /**
                                 * Format: date-time
                                 * @description An ISO 8601 instant (UTC).
                                 */
                                decidedAt: string;
                            } | null;
                        } | null;
                        snapshots: {
                            /** @description An opaque identifier. */
                            id: string;
                            caseVersion: number;
                            caseName: string;
                            /** @enum {string} */
                            status: "in_review" | "approved" | "returned" | "withdrawn";
                            /**
                             * Format: date-time
                             * @description An ISO 8601 instant (UTC).
                             */
                            submittedAt: string;
                            /** @description A person, or an API key as "API key <name> (created by …)"; null when deleted. */
                            submittedBy: string | null;
                            submittedByYou: boolean;
                            decidedAt: string | null;
                            /** @description A person, or an API key as "API key <name> (created by …)"; null when deleted. */
                            decidedBy: string | null;
                            decisionReason: string | null;
                            recommendation: string | null;
                            engineVersion: string;
                            inputHash: string;
                            staticNpv: number | null;
                            optionPremium: number | null;
                            expandedNpv: number | null;
                        }[];
                    };
                };
            };
            /** @description No session and no API key, or a key that is wrong, revoked or expired. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The caller's role does not allow this. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description No such record in the caller's organisation. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Too many requests from this key, or too many estimates at once; see Retry-After. */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Any other error, in the same shape. */
            default: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
        };
    };
    submitCase: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                /** @description An id from an earlier answer. */
                caseId: string;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": {
                    recommendation: string;
                };
            };
        };
        responses: {
            /** @description The snapshot in review. */
            201: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": {
                        snapshot: components["schemas"]["Snapshot"];
                    };
                };
            };
            /** @description No session and no API key, or a key that is wrong, revoked or expired. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The caller's role does not allow this. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description No such record in the caller's organisation. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The input is not valid; `fields` says where. */
            422: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Too many requests from this key, or too many estimates at once; see Retry-After. */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Any other error, in the same shape. */
            default: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
        };
    };
    withdrawCase: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                /** @description An id from an earlier answer. */
                caseId: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description The snapshot, withdrawn. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": {
                        snapshot: components["schemas"]["Snapshot"];
                    };
                };
            };
            /** @description No session and no API key, or a key that is wrong, revoked or expired. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The caller's role does not allow this. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description No such record in the caller's organisation. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Too many requests from this key, or too many estimates at once; see Retry-After. */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Any other error, in the same shape. */
            default: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
        };
    };
    approveCase: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                /** @description An id from an earlier answer. */
                caseId: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description The snapshot, approved. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": {
                        snapshot: components["schemas"]["Snapshot"];
                    };
                };
            };
            /** @description No session and no API key, or a key that is wrong, revoked or expired. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The caller's role does not allow this. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description No such record in the caller's organisation. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Too many requests from this key, or too many estimates at once; see Retry-After. */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Any other error, in the same shape. */
            default: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
        };
    };
    returnCase: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                /** @description An id from an earlier answer. */
                caseId: string;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": {
                    reason: string;
                };
            };
        };
        responses: {
            /** @description The snapshot, returned. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": {
                        snapshot: components["schemas"]["Snapshot"];
                    };
                };
            };
            /** @description No session and no API key, or a key that is wrong, revoked or expired. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The caller's role does not allow this. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description No such record in the caller's organisation. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The input is not valid; `fields` says where. */
            422: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Too many requests from this key, or too many estimates at once; see Retry-After. */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Any other error, in the same shape. */
            default: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
        };
    };
    listComments: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                /** @description An id from an earlier answer. */
                caseId: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description The comments, oldest first. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": {
                        comments: components["schemas"]["Comment"][];
                    };
                };
            };
            /** @description No session and no API key, or a key that is wrong, revoked or expired. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The caller's role does not allow this. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description No such record in the caller's organisation. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Too many requests from this key, or too many estimates at once; see Retry-After. */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Any other error, in the same shape. */
            default: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
        };
    };
    addComment: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                /** @description An id from an earlier answer. */
                caseId: string;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": {
                    /** @description One of general, cash-flows, uncertainty, flexibility, results, lattice, or option:<option id>. */
                    section: string;
                    body: string;
                };
            };
        };
        responses: {
            /** @description The comment. */
            201: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": {
                        comment: components["schemas"]["Comment"];
                    };
                };
            };
            /** @description No session and no API key, or a key that is wrong, revoked or expired. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The caller's role does not allow this. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description No such record in the caller's organisation. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The input is not valid; `fields` says where. */
            422: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Too many requests from this key, or too many estimates at once; see Retry-After. */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Any other error, in the same shape. */
            default: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
        };
    };
    listReviews: {
        parameters: {
            query?: {
                /** @description Comma-separated: in_review (default), approved, returned. */
                status?: string;
            };
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description Cases with their latest snapshot, oldest submission first. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": {
                        cases: components["schemas"]["ReviewQueueItem"][];
                    };
                };
            };
            /** @description No session and no API key, or a key that is wrong, revoked or expired. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The caller's role does not allow this. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The input is not valid; `fields` says where. */
            422: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Too many requests from this key, or too many estimates at once; see Retry-After. */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Any other error, in the same shape. */
            default: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
        };
    };
    addObservation: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                /** @description An id from an earlier answer. */
                caseId: string;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": {
                    date: string;
                    value: number;
                    /** @default  */
                    note?: string;
                    /** @default  */
                    source?: string;
                };
            };
        };
        responses: {
            /** @description Recorded. */
            201: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": {
                        observation: {
                            id: string;
                        };
                    };
                };
            };
            /** @description No session and no API key, or a key that is wrong, revoked or expired. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The caller's role does not allow this. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description No such record in the caller's organisation. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The input is not valid; `fields` says where. */
            422: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Too many requests from this key, or too many estimates at once; see Retry-After. */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Any other error, in the same shape. */
            default: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
        };
    };
    importObservations: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                /** @description An id from an earlier answer. */
                caseId: string;
            };
            cookie?: never;
        };
        /** @description The file (field "file"). */
        requestBody: {
            content: {
                "multipart/form-data": {
                    /** Format: binary */
                    file: string;
                };
            };
        };
        responses: {
            /** @description Recorded: how many values and the dates they span. */
            201: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": {
                        recorded: number;
                        from: string;
                        to: string;
                    };
                };
            };
            /** @description No session and no API key, or a key that is wrong, revoked or expired. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The caller's role does not allow this. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description No such record in the caller's organisation. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The input is not valid; `fields` says where. */
            422: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Too many requests from this key, or too many estimates at once; see Retry-After. */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Any other error, in the same shape. */
            default: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
        };
    };
    recordRightDecision: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                /** @description An id from an earlier answer. */
                caseId: string;
                /** @description An id from an earlier answer. */
                rightId: string;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": {
                    /** @enum {string} */
                    decision: "exercised" | "declined" | "postponed";
                    /** @description YYYY-MM-DD; today when absent. */
                    date?: string;
                    reason: string;
                };
            };
        };
        responses: {
            /** @description Recorded. */
            201: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": {
                        decision: {
                            id: string;
                        };
                    };
                };
            };
            /** @description No session and no API key, or a key that is wrong, revoked or expired. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The caller's role does not allow this. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description No such record in the caller's organisation. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The input is not valid; `fields` says where. */
            422: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Too many requests from this key, or too many estimates at once; see Retry-After. */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Any other error, in the same shape. */
            default: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
        };
    };
    watchCase: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                /** @description An id from an earlier answer. */
                caseId: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description The rights and the observations. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Watch"];
                };
            };
            /** @description No session and no API key, or a key that is wrong, revoked or expired. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The caller's role does not allow this. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description No such record in the caller's organisation. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Too many requests from this key, or too many estimates at once; see Retry-After. */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Any other error, in the same shape. */
            default: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
        };
    };
    boardPack: {
        parameters: {
            query?: {
                /** @description Page size; A4 by default. */
                size?: "A4" | "LETTER";
            };
            header?: never;
            path: {
                /** @description An id from an earlier answer. */
                caseId: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description The PDF. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/pdf": string;
                };
            };
            /** @description No session and no API key, or a key that is wrong, revoked or expired. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The caller's role does not allow this. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description No such record in the caller's organisation. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The input is not valid; `fields` says where. */
            422: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Too many requests from this key, or too many estimates at once; see Retry-After. */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Any other error, in the same shape. */
            default: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
        };
    };
    validationReport: {
        parameters: {
            query?: {
                /** @description Page size; A4 by default. */
                size?: "A4" | "LETTER";
            };
            header?: never;
            path: {
                /** @description An id from an earlier answer. */
                caseId: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description The PDF. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/pdf": string;
                };
            };
            /** @description No session and no API key, or a key that is wrong, revoked or expired. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The caller's role does not allow this. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description No such record in the caller's organisation. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The input is not valid; `fields` says where. */
            422: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Too many requests from this key, or too many estimates at once; see Retry-After. */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Any other error, in the same shape. */
            default: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
        };
    };
    validationWorkbook: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                /** @description An id from an earlier answer. */
                caseId: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description The workbook, one sheet per section. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/vnd.openxmlformats-officedocument.spreadsheetml.sheet": string;
                };
            };
            /** @description No session and no API key, or a key that is wrong, revoked or expired. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The caller's role does not allow this. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description No such record in the caller's organisation. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Too many requests from this key, or too many estimates at once; see Retry-After. */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Any other error, in the same shape. */
            default: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
        };
    };
    attachValidationReport: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                /** @description An id from an earlier answer. */
                caseId: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description The attachment. */
            201: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": {
                        attachment: components["schemas"]["Attachment"];
                    };
                };
            };
            /** @description No session and no API key, or a key that is wrong, revoked or expired. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The caller's role does not allow this. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description No such record in the caller's organisation. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Too many requests from this key, or too many estimates at once; see Retry-After. */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Any other error, in the same shape. */
            default: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
        };
    };
    listAttachments: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                /** @description An id from an earlier answer. */
                caseId: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description The documents, newest first. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": {
                        attachments: components["schemas"]["Attachment"][];
                    };
                };
            };
            /** @description No session and no API key, or a key that is wrong, revoked or expired. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The caller's role does not allow this. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description No such record in the caller's organisation. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Too many requests from this key, or too many estimates at once; see Retry-After. */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Any other error, in the same shape. */
            default: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
        };
    };
    addAttachment: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                /** @description An id from an earlier answer. */
                caseId: string;
            };
            cookie?: never;
        };
        /** @description The document as the field "file". */
        requestBody: {
            content: {
                "multipart/form-data": {
                    /**
                     * Format: binary
                     * @description The document (at most 10 MB).
                     */
                    file: string;
                };
            };
        };
        responses: {
            /** @description The attachment. */
            201: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": {
                        attachment: components["schemas"]["Attachment"];
                    };
                };
            };
            /** @description No session and no API key, or a key that is wrong, revoked or expired. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The caller's role does not allow this. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description No such record in the caller's organisation. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The input is not valid; `fields` says where. */
            422: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Too many requests from this key, or too many estimates at once; see Retry-After. */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Any other error, in the same shape. */
            default: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
        };
    };
    getAttachment: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                /** @description An id from an earlier answer. */
                attachmentId: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description The file as uploaded. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/octet-stream": string;
                };
            };
            /** @description No session and no API key, or a key that is wrong, revoked or expired. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The caller's role does not allow this. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description No such record in the caller's organisation. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Too many requests from this key, or too many estimates at once; see Retry-After. */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Any other error, in the same shape. */
            default: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
        };
    };
    deleteAttachment: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                /** @description An id from an earlier answer. */
                attachmentId: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description Removed. */
            204: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
            /** @description No session and no API key, or a key that is wrong, revoked or expired. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The caller's role does not allow this. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description No such record in the caller's organisation. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Too many requests from this key, or too many estimates at once; see Retry-After. */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Any other error, in the same shape. */
            default: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
        };
    };
    compareCases: {
        parameters: {
            query: {
                /** @description Two to four case ids, comma-separated. */
                cases: string;
            };
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description The comparison. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Comparison"];
                };
            };
            /** @description No session and no API key, or a key that is wrong, revoked or expired. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The caller's role does not allow this. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The input is not valid; `fields` says where. */
            422: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Too many requests from this key, or too many estimates at once; see Retry-After. */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Any other error, in the same shape. */
            default: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
        };
    };
    exportComparison: {
        parameters: {
            query: {
                /** @description Two to four case ids, comma-separated. */
                cases: string;
            };
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description The workbook. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/vnd.openxmlformats-officedocument.spreadsheetml.sheet": string;
                };
            };
            /** @description No session and no API key, or a key that is wrong, revoked or expired. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The caller's role does not allow this. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The input is not valid; `fields` says where. */
            422: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Too many requests from this key, or too many estimates at once; see Retry-After. */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Any other error, in the same shape. */
            default: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
        };
    };
    cashFlowTemplate: {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description The template. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/vnd.openxmlformats-officedocument.spreadsheetml.sheet": string;
                };
            };
            /** @description No session and no API key, or a key that is wrong, revoked or expired. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Too many requests from this key, or too many estimates at once; see Retry-After. */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Any other error, in the same shape. */
            default: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
        };
    };
    volatilityFromHistory: {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /** @description The series as JSON (or multipart/form-data with a file). */
        requestBody: {
            content: {
                "application/json": {
                    series: {
                        date: string;
                        value: number;
                    }[];
                };
            };
        };
        responses: {
            /** @description The estimate with its interval. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["HistoryEstimate"];
                };
            };
            /** @description No session and no API key, or a key that is wrong, revoked or expired. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The caller's role does not allow this. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The input is not valid; `fields` says where. */
            422: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Too many requests from this key, or too many estimates at once; see Retry-After. */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Any other error, in the same shape. */
            default: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
        };
    };
    startSimulation: {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": {
                    caseId: string;
                    spec: {
                        drivers: {
                            /** @enum {string} */
                            line: "revenue" | "operatingCost" | "tax" | "workingCapital";
                            /** @enum {string} */
                            distribution: "normal" | "lognormal" | "triangular" | "uniform";
                            spread: number;
                            /** @default 0 */
                            growth?: number;
                        }[];
                        /** @default [] */
                        correlations?: number[];
                        paths: number;
                        seed: number;
                    };
                };
            };
        };
        responses: {
            /** @description Started: follow it by its id. */
            202: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": {
                        /** @description An opaque identifier. */
                        id: string;
                        /** @constant */
                        status: "running";
                    };
                };
            };
            /** @description No session and no API key, or a key that is wrong, revoked or expired. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The caller's role does not allow this. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The input is not valid; `fields` says where. */
            422: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Too many requests from this key, or too many estimates at once; see Retry-After. */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Any other error, in the same shape. */
            default: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
        };
    };
    getSimulation: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                /** @description An id from an earlier answer. */
                simulationId: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description The estimate. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["VolatilitySimulation"];
                };
            };
            /** @description No session and no API key, or a key that is wrong, revoked or expired. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The caller's role does not allow this. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description No such record in the caller's organisation. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Too many requests from this key, or too many estimates at once; see Retry-After. */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Any other error, in the same shape. */
            default: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
        };
    };
    cancelSimulation: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                /** @description An id from an earlier answer. */
                simulationId: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description Cancelled. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": {
                        id: string;
                        /** @constant */
                        status: "cancelled";
                    };
                };
            };
            /** @description No session and no API key, or a key that is wrong, revoked or expired. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The caller's role does not allow this. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description No such record in the caller's organisation. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Too many requests from this key, or too many estimates at once; see Retry-After. */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Any other error, in the same shape. */
            default: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
        };
    };
    portfolioCsv: {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description One row per project; text neutralised against formulas. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "text/csv": string;
                };
            };
            /** @description No session and no API key, or a key that is wrong, revoked or expired. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The caller's role does not allow this. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Too many requests from this key, or too many estimates at once; see Retry-After. */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Any other error, in the same shape. */
            default: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
        };
    };
    portfolioXlsx: {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description The workbook, with the cautions. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/vnd.openxmlformats-officedocument.spreadsheetml.sheet": string;
                };
            };
            /** @description No session and no API key, or a key that is wrong, revoked or expired. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The caller's role does not allow this. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Too many requests from this key, or too many estimates at once; see Retry-After. */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Any other error, in the same shape. */
            default: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
        };
    };
    startRevaluation: {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description Started: follow it by its id. */
            202: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": {
                        /** @description An opaque identifier. */
                        id: string;
                        /** @constant */
                        status: "running";
                    };
                };
            };
            /** @description No session and no API key, or a key that is wrong, revoked or expired. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The caller's role does not allow this. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Too many requests from this key, or too many estimates at once; see Retry-After. */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Any other error, in the same shape. */
            default: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
        };
    };
    getRevaluation: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                /** @description An id from an earlier answer. */
                revaluationId: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description The re-valuation. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["PortfolioRevaluation"];
                };
            };
            /** @description No session and no API key, or a key that is wrong, revoked or expired. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The caller's role does not allow this. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description No such record in the caller's organisation. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Too many requests from this key, or too many estimates at once; see Retry-After. */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Any other error, in the same shape. */
            default: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
        };
    };
    getSettings: {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description The defaults. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": {
                        settings: components["schemas"]["Settings"];
                    };
                };
            };
            /** @description No session and no API key, or a key that is wrong, revoked or expired. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The caller's role does not allow this. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Too many requests from this key, or too many estimates at once; see Retry-After. */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Any other error, in the same shape. */
            default: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
        };
    };
    updateSettings: {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": {
                    currency: string;
                    riskFreeRate: number;
                    wacc: number;
                    fiscalYearStartMonth: number;
                    alertDaysBeforeClose?: number;
                };
            };
        };
        responses: {
            /** @description The defaults as saved. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": {
                        settings: components["schemas"]["Settings"];
                    };
                };
            };
            /** @description No session and no API key, or a key that is wrong, revoked or expired. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The caller's role does not allow this. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The input is not valid; `fields` says where. */
            422: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Too many requests from this key, or too many estimates at once; see Retry-After. */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Any other error, in the same shape. */
            default: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
        };
    };
    getOrganisationSettings: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                /** @description An id from an earlier answer. */
                orgId: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description The defaults. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": {
                        settings: components["schemas"]["Settings"];
                    };
                };
            };
            /** @description No session and no API key, or a key that is wrong, revoked or expired. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The caller's role does not allow this. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description No such record in the caller's organisation. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Too many requests from this key, or too many estimates at once; see Retry-After. */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Any other error, in the same shape. */
            default: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
        };
    };
    listApiKeys: {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description Live keys first, then revoked ones. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": {
                        apiKeys: components["schemas"]["ApiKey"][];
                    };
                };
            };
            /** @description No session and no API key, or a key that is wrong, revoked or expired. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The caller's role does not allow this. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Too many requests from this key, or too many estimates at once; see Retry-After. */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Any other error, in the same shape. */
            default: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
        };
    };
    createApiKey: {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": {
                    name: string;
                    /** @enum {string} */
                    role: "analyst" | "reviewer" | "viewer";
                    expiresInDays?: number;
                };
            };
        };
        responses: {
            /** @description The key, with its secret. */
            201: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ApiKeyCreated"];
                };
            };
            /** @description No session and no API key, or a key that is wrong, revoked or expired. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The caller's role does not allow this. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The input is not valid; `fields` says where. */
            422: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Too many requests from this key, or too many estimates at once; see Retry-After. */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Any other error, in the same shape. */
            default: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
        };
    };
    revokeApiKey: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                /** @description An id from an earlier answer. */
                keyId: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description Revoked: refused from the next request on. */
            204: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
            /** @description No session and no API key, or a key that is wrong, revoked or expired. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description The caller's role does not allow this. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description No such record in the caller's organisation. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Too many requests from this key, or too many estimates at once; see Retry-After. */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Any other error, in the same shape. */
            default: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
        };
    };
    openApiDocument: {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description The OpenAPI 3.1 description of the API. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": {
                        openapi: string;
                    } & {
                        [key: string]: unknown;
                    };
                };
            };
            /** @description No session and no API key, or a key that is wrong, revoked or expired. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Too many requests from this key, or too many estimates at once; see Retry-After. */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
            /** @description Any other error, in the same shape. */
            default: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["Error"];
                };
            };
        };
    };
}
