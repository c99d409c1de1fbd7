/**
 * The robustness corpus: seeded mutations of the demo and test workbooks and notebooks, each run
 * through the whole pipeline ({@link org.meritbook.robustness.RobustnessCorpusTest}).
 */
package org.meritbook.robustness;
