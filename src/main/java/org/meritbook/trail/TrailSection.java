package org.meritbook.trail;

import java.util.List;

/** The steps of one notebook cell, with the cell's id and title, for trail renderings. */
public record TrailSection(String id, String title, List<Step> steps) {
    public TrailSection {
        steps = List.copyOf(steps);
    }
}
