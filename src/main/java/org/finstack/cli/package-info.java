/** The {@code finstack} command line (picocli): one subcommand per job, units chosen by the user. */
package org.finstack.cli;
