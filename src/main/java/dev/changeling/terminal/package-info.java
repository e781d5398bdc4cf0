/** The terminal: colours, progress and diff rendering. */
package dev.changeling.terminal;
