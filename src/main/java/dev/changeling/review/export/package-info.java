/**
 * The attachments for a review, all read from the results file: Markdown for a comment, SARIF 2.1.0, a self-contained
 * HTML page with pictures, one patch per survivor.
 */
package dev.changeling.review.export;
