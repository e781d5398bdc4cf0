/** Runs inside the test JVM. Uses only the JDK and the JUnit Platform API, never the rest of the tool. */
package dev.changeling.worker;
