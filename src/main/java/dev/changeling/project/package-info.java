/**
 * The project: its layout, located once for every command (the pom's folders, or folders given by hand), its
 * classes and test classpath through the real mvn, and the suite as Surefire runs it.
 */
package dev.changeling.project;
