/** The mutation operators, one small class each, and the one registry that lists them. */
package dev.changeling.operator;
