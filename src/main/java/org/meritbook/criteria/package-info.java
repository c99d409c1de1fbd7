/**
 * Acceptance: profiles of rules (built in, or a laboratory's YAML file) that judge each section after
 * its analysis, giving {@link org.meritbook.analysis.Verdict}s (pass / fail / not evaluable, with the
 * rule text and the value). Built-in limits are defaults, stated with their sources, to be confirmed
 * locally. Format and profiles: docs/criteria.md.
 */
package org.meritbook.criteria;
