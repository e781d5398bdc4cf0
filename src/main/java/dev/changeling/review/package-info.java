/**
 * The views a reviewer works in, above the engine: where a run stands ({@code Standing}) and the one gate
 * ({@code Gate}), the decisions kept in the project (the committed equivalents list and its rules, the local
 * triage marks, what is settled), the triage loop ({@code triage/}) and the attachments for the review
 * ({@code export/}). Everything here reads the results file; nothing in the engine imports this package.
 */
package dev.changeling.review;
