/** Compiles mutants: mutant schemata for a whole class at once, one compile per mutant where a schema will not compile. */
package dev.changeling.compile;
