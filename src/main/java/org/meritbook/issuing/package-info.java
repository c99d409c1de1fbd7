/**
 * Issuing a revision: the one sequence that parses a notebook, runs it, renders the dossier and
 * publishes the revision's output set, shared by {@code meritbook run} and the live page's "Issue
 * revision" so both write exactly the same files.
 */
package org.meritbook.issuing;
