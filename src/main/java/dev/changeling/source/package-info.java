/** Java files as text and trees: parsing, spans, offsets and line numbers. */
package dev.changeling.source;
