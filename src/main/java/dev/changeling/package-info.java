/** Changeling: mutation analysis for code review. The packages follow the pipeline; DEVELOPERS.md draws it. */
package dev.changeling;
