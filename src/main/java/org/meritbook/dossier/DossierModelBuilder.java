package org.meritbook.dossier;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.commonmark.node.Node;
import org.meritbook.analysis.Quantity;
import org.meritbook.analysis.SectionResult;
import org.meritbook.criteria.AcceptanceProfile;
import org.meritbook.analysis.Verdict;
import org.meritbook.dossier.DossierView.Chapter;
import org.meritbook.dossier.DossierView.Cover;
import org.meritbook.dossier.DossierView.InputRow;
import org.meritbook.dossier.DossierView.Notes;
import org.meritbook.dossier.DossierView.ChangeGroup;
import org.meritbook.dossier.DossierView.ChangeRow;
import org.meritbook.dossier.DossierView.Changes;
import org.meritbook.dossier.DossierView.Profile;
import org.meritbook.dossier.DossierView.ProfileRule;
import org.meritbook.dossier.DossierView.RevisionRow;
import org.meritbook.dossier.DossierView.SoftwareRow;
import org.meritbook.dossier.DossierView.Summary;
import org.meritbook.dossier.DossierView.SummaryRow;
import org.meritbook.dossier.DossierView.TocEntry;
import org.meritbook.dossier.DossierView.TrailGroup;
import org.meritbook.pipeline.StudyResults;
import org.meritbook.revision.RevisionContext;
import org.meritbook.revision.RevisionDiff;
import org.meritbook.revision.RevisionEntry;
import org.meritbook.pipeline.InputFile;
import org.meritbook.study.AnalysisCell;
import org.meritbook.study.FrontMatter;
import org.meritbook.study.Status;

/** Turns {@link StudyResults} into the {@link DossierView}: all wording of fixed texts and all formatting. */
final class DossierModelBuilder {
    static final String CAUTION = "The computations in this dossier support, and do not replace, the laboratory's "
            + "own review under its procedures and the regulations that apply to it.";
    static final String NO_CRITERION = "no criterion set";
    /** The criterion of a result one verdict judges with others (a run's QCs), stated there. */
    static final String TOGETHER = "judged with the others, below";

    private final DisplayFormatter format = new DisplayFormatter();
    private final NarrativeRenderer narrative = new NarrativeRenderer();
    private final RenderEnvironment environment;
    private final List<SoftwareRow> renderingLibraries;

    DossierModelBuilder(RenderEnvironment environment, List<SoftwareRow> renderingLibraries) {
        this.environment = environment;
        this.renderingLibraries = List.copyOf(renderingLibraries);
    }

    /** @param figureArt takes each figure and gives the placeholder the view holds until the drawing is done */
    DossierView build(StudyResults results, List<PdfAFinisher.Embedded> files, DocumentDate date, String documentId,
                      RevisionContext earlier, FigureArt figureArt) {
        FrontMatter fm = results.study().frontMatter();
        NarrativePlacement placement = new NarrativePlacement(results.study(), narrative);
        List<TocEntry> toc = new ArrayList<>();
        int chapter = 0;

        Chapter intro = chapter(placement.intro(), "Introduction", "intro", chapter + 1);
        if (intro.present()) {
            chapter++;
            toc.add(new TocEntry(intro.number(), intro.title(), intro.anchor(), List.of()));
        }
        String summaryNumber = String.valueOf(++chapter);
        toc.add(new TocEntry(summaryNumber, "Summary of results", "summary", List.of()));

        Map<String, SectionResult> byId = new LinkedHashMap<>();
        results.sections().forEach(s -> byId.put(s.id(), s));
        TrailViewBuilder trail = new TrailViewBuilder(results.sections(), "A", format);
        Map<String, String> attachedTables = new LinkedHashMap<>();
        files.forEach(e -> attachedTables.put(e.attachment().alias(), e.attachment().name()));
        SectionViewBuilder sectionBuilder = new SectionViewBuilder(format, figureArt, trail, attachedTables);
        List<SectionView> sections = new ArrayList<>();
        for (AnalysisCell cell : results.study().cells()) {
            String number = String.valueOf(++chapter);
            String anchor = "sec-" + number;
            Markup before = narrative.render(placement.before(cell.id()));
            Markup after = narrative.render(placement.after(cell.id()));
            SectionResult r = byId.get(cell.id());
            SectionView view = r == null
                    ? new SectionView(number, anchor, cell.id(), cell.kind().keyword(), cell.title(), before, after,
                    List.of(), SectionView.TableView.none(), List.of(), List.of(),
                    List.of(), List.of(), List.of("This analysis produced no result."), false)
                    : sectionBuilder.build(number, anchor, r, before, after, results.supporting(r));
            sections.add(view);
            toc.add(new TocEntry(number, view.title(), anchor, List.of()));
        }
        Chapter closing = closing(placement.closing(), chapter + 1);
        if (closing.present()) {
            toc.add(new TocEntry(closing.number(), closing.title(), closing.anchor(), List.of()));
        }
        List<TrailGroup> trailGroups = trail.groups();
        toc.add(new TocEntry("A", "Calculation trail", "trail",
                trailGroups.stream().map(g -> new TocEntry(g.number(), g.title(), g.anchor(), List.of())).toList()));
        toc.add(new TocEntry("B", "Input manifest", "manifest", List.of()));
        toc.add(new TocEntry("C", "Software and environment", "software", List.of()));

        Summary summary = summary(summaryNumber, results, sections, profile(results.acceptance()),
                results.warnings());
        Cover cover = new Cover(fm.title(), orDash(fm.method()), orDash(fm.laboratory()),
                String.valueOf(fm.revision()), date.display(), orDash(fm.preparedBy()), status(fm), summary.counts(),
                fm.criteria() == null ? "none named" : fm.criteria(), documentId,
                signOff(fm, Status.REVIEWED, "reviewed"), signOff(fm, Status.APPROVED, "approved"));
        List<RevisionRow> revisions = new ArrayList<>();
        for (RevisionEntry e : earlier.earlier()) {
            revisions.add(new RevisionRow(String.valueOf(e.revision()), orDash(e.date()), orDash(e.reason()),
                    orDash(e.preparedBy())));
        }
        revisions.add(new RevisionRow(String.valueOf(fm.revision()), date.display(),
                fm.revisionReason() == null || fm.revisionReason().isBlank()
                        ? (fm.revision() == 1 ? "First issue" : "No reason stated in the notebook")
                        : fm.revisionReason(), orDash(fm.preparedBy())));
        Notes notes = new Notes(CAUTION,
                criteriaNote(results.acceptance(), fm),
                "Characters that the embedded fonts cannot draw appear in the PDF as their code point, e.g. "
                        + "[U+4E2D]; the HTML version and the attached notebook keep the original text.",
                "Results are rounded for display only (rules in the meritbook documentation, docs/dossier.md); "
                        + "results.json, attached, holds every value at full precision.");
        return new DossierView(true, cover, revisions, changes(earlier), toc, summary, intro, sections, closing, trailGroups,
                inputs(results, files), software(results), notes);
    }

    /** Only meritbook's built-in profiles are defaults; a lab's own file is the lab's criteria. */
    static String criteriaNote(AcceptanceProfile profile, FrontMatter fm) {
        if (profile == null) {
            return "No acceptance profile is named, so no result is judged.";
        }
        if (!"built in".equals(profile.origin())) {
            return "Acceptance criteria are the laboratory's own (profile file " + profile.origin()
                    + ", attached); they are applied as written; " + profile.comparison().statement() + ".";
        }
        return "Acceptance criteria are defaults (profile " + fm.criteria() + ")"
                + " and must be confirmed locally before this dossier is relied on; "
                + profile.comparison().statement() + ".";
    }

    private static Changes changes(RevisionContext earlier) {
        if (earlier.changes().isEmpty()) {
            return new Changes(false, "", List.of());
        }
        RevisionDiff diff = earlier.changes().get();
        int previous = earlier.earlier().get(earlier.earlier().size() - 1).revision();
        List<ChangeGroup> groups = new ArrayList<>();
        addGroup(groups, "Input files", diff.inputs());
        addGroup(groups, "Input cells", diff.cells());
        addGroup(groups, "Settings", diff.settings());
        addGroup(groups, "Results (full precision)", diff.results());
        return new Changes(true, "revision " + previous + " (" + earlier.sinceFile() + ")", groups);
    }

    private static void addGroup(List<ChangeGroup> groups, String title, List<RevisionDiff.Change> changes) {
        if (!changes.isEmpty()) {
            groups.add(new ChangeGroup(title + " (" + changes.size() + ")", changes.stream()
                    .map(c -> new ChangeRow(c.what(), c.before() == null ? "—" : c.before(),
                            c.after() == null ? "—" : c.after()))
                    .toList()));
        }
    }

    private Chapter chapter(List<Node> blocks, String title, String anchor, int number) {
        if (blocks.isEmpty()) {
            return new Chapter(false, "", title, anchor, new Markup(""));
        }
        return new Chapter(true, String.valueOf(number), title, anchor, narrative.render(blocks));
    }

    /** Closing notes take their title from a leading heading when the notebook gives one. */
    private Chapter closing(List<Node> blocks, int number) {
        String first = blocks.isEmpty() ? null : NarrativeRenderer.headingText(blocks.get(0));
        if (first != null && !first.isBlank()) {
            return chapter(blocks.subList(1, blocks.size()), first, "closing", number);
        }
        return chapter(blocks, "Closing notes", "closing", number);
    }

    private static Profile profile(AcceptanceProfile p) {
        if (p == null) {
            return new Profile(false, "", "", List.of());
        }
        // How a value meets its limit is part of the criteria: stated beside them.
        String compared = "Comparison: " + p.comparison().statement() + " (compare: " + p.comparison().word() + ").";
        return new Profile(true, p.name() + " (" + p.origin() + ")",
                p.description() == null || p.description().isBlank() ? compared : p.description() + " " + compared,
                p.rules().stream().map(r -> new ProfileRule(r.text(), r.source())).toList());
    }

    private Summary summary(String number, StudyResults study, List<SectionView> views, Profile profile,
                            List<String> warnings) {
        List<SectionResult> results = study.sections();
        List<SummaryRow> rows = new ArrayList<>();
        int pass = 0, fail = 0, na = 0, none = 0, supportingVerdicts = 0;
        for (SectionResult r : results) {
            boolean supporting = study.supporting(r);
            String anchor = views.stream().filter(v -> v.id().equals(r.id())).map(SectionView::anchor).findFirst()
                    .orElse("");
            String section = SectionViewBuilder.title(r);
            for (Quantity q : r.quantities()) {
                if (!q.summary()) {
                    continue;
                }
                DisplayFormatter.Formatted v = format.quantity(q);
                List<Verdict> judged = r.verdicts().stream().filter(x -> q.name().equals(x.quantity())).toList();
                // a member of a family one verdict judges together (a run's QCs): pointed to that verdict
                String family = q.name().contains(":") ? q.name().substring(0, q.name().indexOf(':')) : null;
                Optional<Verdict> together = judged.isEmpty() && family != null
                        ? r.verdicts().stream().filter(x -> family.equals(x.quantity())).findFirst() : Optional.empty();
                if (together.isPresent()) {
                    rows.add(new SummaryRow(section, anchor, q.label(), v.withUnit(), v.uncertainty(), TOGETHER,
                            Verdicts.together(together.get())));
                } else if (judged.isEmpty()) {
                    rows.add(new SummaryRow(section, anchor, q.label(), v.withUnit(), v.uncertainty(), NO_CRITERION,
                            Verdicts.NONE));
                    none++;
                }
                for (Verdict x : judged) {
                    rows.add(new SummaryRow(section, anchor, q.label(), v.withUnit(), v.uncertainty(), x.rule(),
                            Verdicts.view(x, supporting)));
                }
            }
            for (Verdict x : r.verdicts()) {
                Optional<Quantity> q = x.quantity() == null ? Optional.empty() : r.quantity(x.quantity());
                if (q.isPresent() && q.get().summary()) {
                    continue; // already listed with its quantity
                }
                DisplayFormatter.Formatted v = q.map(format::quantity).orElse(null);
                rows.add(new SummaryRow(section, anchor, x.characteristic(), v == null ? "—" : v.withUnit(),
                        v == null ? "" : v.uncertainty(), x.rule(), Verdicts.view(x, supporting)));
            }
            if (supporting) {
                supportingVerdicts += r.verdicts().size(); // shown above, kept out of the counts
                continue;
            }
            for (Verdict x : r.verdicts()) {
                switch (x.outcome()) {
                    case PASS -> pass++;
                    case FAIL -> fail++;
                    case NOT_EVALUABLE -> na++;
                    default -> throw new IllegalStateException("outcome " + x.outcome() + " is not counted");
                }
            }
        }
        // Every section's warnings reach the summary and the count, not only the section (issue 6).
        List<String> all = new ArrayList<>(warnings);
        for (SectionResult r : results) {
            String section = SectionViewBuilder.title(r);
            r.warnings().forEach(w -> all.add(section + ": " + w));
        }
        String counts = pass + " passed, " + fail + " failed, " + na + " not evaluable; " + none
                + (none == 1 ? " result" : " results") + " without a criterion; " + all.size()
                + (all.size() == 1 ? " warning" : " warnings")
                + (supportingVerdicts == 0 ? "" : "; " + supportingVerdicts + " verdict" + (supportingVerdicts == 1 ? "" : "s")
                        + " of supporting checks not counted");
        return new Summary(number, rows, counts, profile, all);
    }

    private List<InputRow> inputs(StudyResults results, List<PdfAFinisher.Embedded> files) {
        List<InputRow> rows = new ArrayList<>();
        for (InputFile f : results.inputs()) {
            String attached = files.stream().map(PdfAFinisher.Embedded::attachment)
                    .filter(a -> a.alias().equals(f.alias())).map(Attachment::name).findFirst().orElse("not attached");
            rows.add(new InputRow(f.alias(), f.path(), format.bytes(f.bytes()), f.sha256(), f.ranges(), attached));
        }
        for (PdfAFinisher.Embedded e : files) {
            if (e.attachment().source() == null) { // produced by this run: results.json, long data tables
                rows.add(new InputRow(e.attachment().alias(), e.attachment().name(), format.bytes(e.bytes().length),
                        DossierRenderer.sha256Hex(e.bytes()), List.of(), e.attachment().name()));
            }
        }
        return rows;
    }

    private List<SoftwareRow> software(StudyResults results) {
        Map<String, String> rows = new LinkedHashMap<>();
        results.software().forEach(c -> rows.putIfAbsent(c.name(), c.version()));
        renderingLibraries.forEach(c -> rows.putIfAbsent(c.name(), c.version()));
        rows.putIfAbsent("Java runtime", environment.javaRuntime());
        rows.putIfAbsent("Operating system", environment.operatingSystem());
        return rows.entrySet().stream().map(e -> new SoftwareRow(e.getKey(), e.getValue())).toList();
    }

    /** The parser has refused any other status and a claimed sign-off without its keys. */
    private static String status(FrontMatter fm) {
        return Status.of(fm).display();
    }

    /** The sign-off the status has reached, from its keys; an empty row before it. */
    private static DossierView.SignOff signOff(FrontMatter fm, Status needed, String role) {
        Status status = Status.of(fm);
        if (status.ordinal() < needed.ordinal() || fm.all() == null) {
            return DossierView.SignOff.NONE;
        }
        Object name = fm.all().get(role + "-by");
        Object date = fm.all().get(role + "-on");
        return new DossierView.SignOff(name == null ? "" : name.toString(), date == null ? "" : date.toString());
    }

    private static String orDash(String s) {
        return s == null || s.isBlank() ? "not stated" : s;
    }
}
