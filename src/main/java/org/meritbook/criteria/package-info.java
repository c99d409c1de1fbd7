/**
 * Acceptance: {@link org.meritbook.criteria.Verdict}s (pass / fail / not evaluable, with the rule
 * text). Acceptance profiles come with a later version; until then the dossier says "no criterion set".
 */
package org.meritbook.criteria;
