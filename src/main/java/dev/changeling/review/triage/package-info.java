/**
 * The triage loop: walks the unresolved survivors of the last run one at a time and records what the
 * developer decides about each, as it is decided.
 */
package dev.changeling.review.triage;
