/** Code review: scope to a change, triage decisions, the equivalents list and the attachments for the review. */
package dev.changeling.review;
