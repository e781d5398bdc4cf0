/** Runs inside the test JVM. Uses only the JDK, the JUnit Platform API and the probe, never the rest of the tool. */
package dev.changeling.worker;
