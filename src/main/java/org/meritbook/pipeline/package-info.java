/**
 * Wires the stages: notebook → data blocks → analyses → {@link org.meritbook.pipeline.StudyResults}.
 * Holds no statistics and no rendering.
 */
package org.meritbook.pipeline;
