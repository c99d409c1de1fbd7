package org.meritbook.study;

import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.regex.Pattern;
import org.meritbook.study.StarterNotebook.Block;
import org.meritbook.study.StarterNotebook.BlockColumn;

/**
 * Guesses, from a block's headers and title, the cell of a kind other than calibration that a
 * starter notebook proposes: blanks (detection limits), spikes with added and found amounts
 * (accuracy), replicates by day or run (precision), samples to read back (unknowns). Each cell
 * says in a comment which headers it was guessed from.
 */
final class StarterCells {
    private static final Pattern BLANK = Pattern.compile("(?i).*\\bblank.*");
    private static final Pattern LIMIT_STUDY = Pattern.compile("(?i).*\\b(mdl|lod|lob|detection|detection limit)\\b.*");
    private static final Pattern ADDED = Pattern.compile("(?i).*\\b(added|spiked?|spike level|known|nominal|reference)\\b.*");
    private static final Pattern FOUND = Pattern.compile("(?i).*\\b(measured|found|result|determined|recovered)\\b.*");
    private static final Pattern UNSPIKED = Pattern.compile("(?i).*\\b(unspiked|background|native)\\b.*");
    private static final Pattern GROUP = Pattern.compile("(?i).*\\b(day|run|series|analyst|batch|session)\\b.*");
    private static final Pattern LEVEL = Pattern.compile("(?i).*\\b(level|qc|material)\\b.*");
    private static final Pattern VALUE = Pattern.compile("(?i).*\\b(result|value|measured|found|conc|concentration)\\b.*");
    private static final Pattern SAMPLE = Pattern.compile("(?i).*\\b(sample|sample id|specimen)\\b.*");
    private static final Pattern RESPONSE =
            Pattern.compile("(?i).*\\b(area|height|signal|response|abs|absorbance|counts|intensity|ratio)\\b.*");
    private static final Pattern MASS = Pattern.compile("(?i).*\\b(mass|weight|portion)\\b.*");
    private static final Pattern VOLUME = Pattern.compile("(?i).*\\b(volume|made up)\\b.*");
    private static final Pattern DILUTION = Pattern.compile("(?i).*\\b(dilution|df)\\b.*");

    private StarterCells() {
    }

    /** Whether the headers point to a kind other than calibration, so no calibration is guessed there. */
    static boolean looksLikeOtherKind(Block b) {
        return blanks(b) || spikes(b).isPresent() || samples(b).isPresent();
    }

    static Optional<String> propose(Block b, boolean calibrationAbove) {
        Optional<BlockColumn> found = any(b, FOUND, true);
        Optional<BlockColumn> added = spikes(b);
        if (added.isPresent() && found.isPresent() && LIMIT_STUDY.matcher(b.title()).matches()) {
            return Optional.of("```detection-limit\n# Guessed from the title '" + b.title() + "': replicate spikes in '"
                    + found.get().header() + "' for the spiked-sample MDL. Check them; add method blanks if you have them.\n"
                    + "methods: [mdl]\n"
                    + "spikes:\n  data: " + b.reference() + "\n  column: " + found.get().name() + "\n"
                    + "```\n");
        }
        if (added.isPresent() && found.isPresent()) {
            Optional<BlockColumn> unspiked = any(b, UNSPIKED, true);
            Optional<BlockColumn> level = any(b, LEVEL, false).filter(c -> c != added.get());
            return Optional.of("```accuracy\n# Guessed from the headers: '" + found.get().header() + "' measured against '"
                    + added.get().header() + "' (added or known)" + unspiked.map(u -> ", '" + u.header()
                    + "' as the unspiked result").orElse("") + ". Check them.\n"
                    + "data: " + b.reference() + "\n"
                    + "measured: " + found.get().name() + "\n"
                    + "known: " + added.get().name() + "\n"
                    + unspiked.map(u -> "unspiked: " + u.name() + "\n").orElse("")
                    + level.map(l -> "level: " + l.name() + "\n").orElse("")
                    + "```\n");
        }
        if (blanks(b)) {
            Optional<String> cell = blankCell(b, calibrationAbove);
            if (cell.isPresent()) {
                return cell;
            }
        }
        Optional<BlockColumn> sample = samples(b);
        Optional<BlockColumn> response = any(b, RESPONSE, true);
        if (sample.isPresent() && response.isPresent() && calibrationAbove) {
            StringBuilder cell = new StringBuilder("```unknowns\n# Guessed from the headers: samples in '"
                    + sample.get().header() + "', responses in '" + response.get().header()
                    + "', read back through the calibration above. Check them.\n"
                    + "calibration: calibration\n"
                    + "data: " + b.reference() + "\n"
                    + "sample: " + sample.get().name() + "\n"
                    + "y: " + response.get().name() + "\n");
            Optional<BlockColumn> mass = any(b, MASS, true);
            Optional<BlockColumn> volume = any(b, VOLUME, true);
            if (mass.isPresent() && volume.isPresent()) {
                cell.append("mass: ").append(mass.get().name()).append('\n')
                        .append("volume: ").append(volume.get().name()).append('\n');
                any(b, DILUTION, true).ifPresent(d -> cell.append("dilution: ").append(d.name()).append('\n'));
            }
            return Optional.of(cell.append("```\n").toString());
        }
        Optional<BlockColumn> group = any(b, GROUP, false);
        Optional<BlockColumn> value = any(b, VALUE, true).filter(v -> group.map(g -> g != v).orElse(true));
        if (group.isPresent() && value.isPresent()) {
            Optional<BlockColumn> level = any(b, LEVEL, false).filter(c -> c != group.get());
            return Optional.of("```precision\n# Guessed from the headers: replicates in '" + value.get().header()
                    + "' grouped by '" + group.get().header() + "'" + level.map(l -> ", one analysis per '"
                    + l.header() + "'").orElse("") + ". Check them.\n"
                    + "data: " + b.reference() + "\n"
                    + "value: " + value.get().name() + "\n"
                    + "group: " + group.get().name() + "\n"
                    + level.map(l -> "level: " + l.name() + "\n").orElse("")
                    + "```\n");
        }
        return Optional.empty();
    }

    /** Blanks: signals converted through a calibration above, or results already in concentration units. */
    private static Optional<String> blankCell(Block b, boolean calibrationAbove) {
        Optional<BlockColumn> signal = any(b, RESPONSE, true);
        Optional<BlockColumn> result = any(b, VALUE, true);
        if (signal.isPresent()) {
            return Optional.of("```detection-limit\n# Guessed from the title or headers: blank signals in '"
                    + signal.get().header() + "'. Check the column and the methods.\n"
                    + (calibrationAbove ? "calibration: calibration\nmethods: [blank, response-sd]\n"
                            : "methods: [blank]   # needs a calibration cell above to convert signals: add calibration: <id>\n")
                    + "blanks:\n  data: " + b.reference() + "\n  column: " + signal.get().name() + "\n"
                    + (calibrationAbove ? "sigma: blank\n" : "")
                    + "```\n");
        }
        return result.map(r -> "```detection-limit\n# Guessed from the title or headers: blank results in '" + r.header()
                + "', already in concentration units. Check the column and the methods.\n"
                + "methods: [blank]\n"
                + "blanks:\n  data: " + b.reference() + "\n  column: " + r.name() + "\n  units: concentration\n"
                + "```\n");
    }

    private static boolean blanks(Block b) {
        return BLANK.matcher(b.title()).matches()
                || b.columns().stream().anyMatch(c -> BLANK.matcher(c.name()).matches());
    }

    private static Optional<BlockColumn> spikes(Block b) {
        return any(b, ADDED, true).filter(a -> any(b, FOUND, true).map(f -> f != a).orElse(false));
    }

    private static Optional<BlockColumn> samples(Block b) {
        return any(b, SAMPLE, false);
    }

    private static Optional<BlockColumn> any(Block b, Pattern pattern, boolean numeric) {
        List<BlockColumn> columns = b.columns();
        return columns.stream().filter(c -> !numeric || c.numeric())
                .filter(c -> pattern.matcher(c.name().toLowerCase(Locale.ROOT)).matches()).findFirst();
    }
}
