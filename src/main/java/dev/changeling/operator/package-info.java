/**
 * The mutation operators, one small class each, the one registry that lists them, and the catalogue
 * ({@code operators/<id>.md}) that describes each operator and whose worked examples the tests run.
 */
package dev.changeling.operator;
