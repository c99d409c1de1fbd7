package org.meritbook.dossier;

import org.meritbook.criteria.Verdict;
import org.meritbook.dossier.DossierView.VerdictView;

/** How outcomes read: a word and a symbol, so that colour is never the only signal. */
final class Verdicts {
    static final VerdictView NONE = new VerdictView("Not judged", "–", "none", "");

    private Verdicts() {
    }

    static VerdictView view(Verdict v) {
        String reason = v.reason() == null ? "" : v.reason();
        return switch (v.outcome()) {
            case PASS -> new VerdictView("Pass", "✓", "pass", reason);
            case FAIL -> new VerdictView("Fail", "✗", "fail", reason);
            case NOT_EVALUABLE -> new VerdictView("Not evaluable", "?", "na", reason);
        };
    }
}
