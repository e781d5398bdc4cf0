/**
 * The picocli commands: they collect what the user typed, hand it to the core to resolve ({@code RunInput},
 * {@code SelectionInput}) and run, and render the result. No JavaParser or JUnit types here.
 */
package dev.changeling.cli;
