/**
 * The error kind every module shares: {@link org.linemass.errors.InternalException}, a bug that
 * the command line maps to exit code 3 with a request to report it. The other two kinds stay
 * where they arise: the importer's and the engine's input-error types (bad file or settings, with
 * a location; exit 2) and {@link java.lang.IllegalArgumentException} for a bad argument to a
 * method (a bug in the caller unless the caller turned a user's value into it).
 */
package org.linemass.errors;
