package org.meritbook.dossier;

import org.meritbook.analysis.Verdict;
import org.meritbook.dossier.DossierView.VerdictView;

/** How outcomes read: a word and a symbol, so that colour is never the only signal. */
final class Verdicts {
    static final VerdictView NONE = new VerdictView("Not judged", "–", "none", "");

    private Verdicts() {
    }

    /** Said beside each verdict of a cell marked {@code role: supporting}. */
    static final String SUPPORTING = "supporting check: not counted in the overall outcome";

    static VerdictView view(Verdict v) {
        return view(v, false);
    }

    /** A result judged together with others by one verdict (a run's QCs): not a verdict of its own. */
    static VerdictView together(Verdict v) {
        return new VerdictView("Judged together", "↓", "none", "in '" + v.characteristic() + "' below");
    }

    /** The verdict, with the note that it does not count when its cell is a supporting one. */
    static VerdictView view(Verdict v, boolean supporting) {
        String given = v.reason() == null ? "" : v.reason();
        String reason = supporting ? (given.isEmpty() ? SUPPORTING : given + " (" + SUPPORTING + ")") : given;
        return switch (v.outcome()) {
            case PASS -> new VerdictView("Pass", "✓", "pass", reason);
            case FAIL -> new VerdictView("Fail", "✗", "fail", reason);
            case NOT_EVALUABLE -> new VerdictView("Not evaluable", "?", "na", reason);
        };
    }
}
