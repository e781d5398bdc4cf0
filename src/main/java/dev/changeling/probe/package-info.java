/** The switch that schema-rewritten code calls, recording which mutation points were reached. JDK only. */
package dev.changeling.probe;
