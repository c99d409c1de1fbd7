/**
 * Wires the stages: notebook → data blocks → analyses → {@link org.meritbook.pipeline.StudyResults},
 * deciding which files are the run's inputs; and publishes a revision's output set as a whole
 * ({@link org.meritbook.pipeline.StudyFolder}). Holds no statistics and no rendering.
 */
package org.meritbook.pipeline;
