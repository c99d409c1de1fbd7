/** The command line: thin commands wiring reader → core → renderer, exit codes by error class. */
package org.meritbook.cli;
