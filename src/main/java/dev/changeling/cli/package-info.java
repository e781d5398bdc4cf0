/** The picocli commands: options become a request, the core does the work, the result is rendered. No JavaParser or JUnit types here. */
package dev.changeling.cli;
