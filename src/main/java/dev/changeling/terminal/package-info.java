/** The terminal: colours, progress, diff rendering, and the text pictures of a run (line strips, the shaded kill table). */
package dev.changeling.terminal;
