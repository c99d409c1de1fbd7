/** The calculation trail: one {@link org.meritbook.trail.Step} per computed quantity, in order. */
package org.meritbook.trail;
