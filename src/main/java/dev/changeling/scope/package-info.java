/**
 * The change under review: the lines a git revision, the uncommitted work or a diff file touches,
 * used to narrow the mutation points to them. Below the engine; knows nothing of the views.
 */
package dev.changeling.scope;
