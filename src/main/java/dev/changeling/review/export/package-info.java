/** The attachments for a review, all read from the results file: Markdown for a comment, SARIF 2.1.0, one patch per survivor. */
package dev.changeling.review.export;
