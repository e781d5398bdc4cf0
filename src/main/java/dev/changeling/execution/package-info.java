/** Runs the project's tests against mutants in worker JVMs: pool, protocol, deadlines and verdicts. */
package dev.changeling.execution;
