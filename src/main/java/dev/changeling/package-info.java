/** Changeling: mutation analysis for code review. The packages below split it by feature. */
package dev.changeling;
