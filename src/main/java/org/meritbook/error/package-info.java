/**
 * The small exception family: located, keyed input problems ({@link org.meritbook.error.InputException})
 * phrased as expected-versus-found with a fix. Anything else escaping a command is an internal error.
 */
package org.meritbook.error;
