/** Finds a project's sources, compiled classes and test classpath, through the real mvn or explicit options. */
package dev.changeling.project;
