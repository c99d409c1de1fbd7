package org.meritbook.dossier;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Set;
import org.junit.jupiter.api.Test;

class UnusedStyleRulesTest {
    private static final String PAGE = "<html xmlns=\"http://www.w3.org/1999/xhtml\"><head><title>t</title></head>"
            + "<body><div class=\"grid wide\" id=\"top\"><table><tr><td class=\"c-num\" dir=\"ltr\">1</td></tr></table>"
            + "</div>%s</body></html>";
    private static final StyleVocabulary TEXT_ONLY = StyleVocabulary.of(PdfRenderer.parse(String.format(PAGE, "")));
    private static final StyleVocabulary WITH_FIGURE = StyleVocabulary.of(PdfRenderer.parse(String.format(PAGE,
            "<svg xmlns=\"http://www.w3.org/2000/svg\" width=\"10\" height=\"10\"></svg>")));

    @Test
    void theVocabularyHoldsThePagesNamesClassesIdsAndAttributesLowerCased() {
        assertTrue(TEXT_ONLY.elements().containsAll(Set.of("html", "body", "div", "table", "td", "title")));
        assertEquals(Set.of("grid", "wide", "c-num"), TEXT_ONLY.classes());
        assertEquals(Set.of("top"), TEXT_ONLY.ids());
        assertTrue(TEXT_ONLY.attributes().containsAll(Set.of("class", "id", "dir")));
        assertFalse(TEXT_ONLY.figures());
        assertTrue(WITH_FIGURE.figures());
    }

    @Test
    void aSelectorNamingWhatThePageLacksGoesAndTheRestStaysInOrder() {
        String css = "h1, td, input { color: red }\n.grid td.c-num { width: 1mm }\n.steps .src { color: blue }\n"
                + "#top > table { margin: 0 }\n#bottom { margin: 0 }\nTD[dir=ltr], p[dir=\"rtl\"] { direction: ltr }\n";
        assertEquals("td { color: red }\n.grid td.c-num { width: 1mm }\n#top > table { margin: 0 }\n"
                + "TD[dir=ltr] { direction: ltr }\n", UnusedStyleRules.prune(css, TEXT_ONLY));
    }

    @Test
    void whatMayBeInsideAFigureStays() {
        // A figure's drawing goes in after layout: any SVG element, class, id or attribute may be there.
        String css = "line, svg g { stroke: red }\n.legend { display: none }\n#clip1 { fill: none }\n[fill] { opacity: 1 }\n"
                + "input { border: 1px solid black }\n";
        assertEquals("line, svg g { stroke: red }\n.legend { display: none }\n#clip1 { fill: none }\n[fill] { opacity: 1 }\n",
                UnusedStyleRules.prune(css, WITH_FIGURE));
        assertEquals("", UnusedStyleRules.prune(css, TEXT_ONLY));
    }

    @Test
    void pseudoClassesAndElementsReadHereAreJudgedByTheirCompound() {
        String css = "a:link, a:visited { text-decoration: underline }\nbr:before { content: \"\\A\" }\n"
                + "td:first-child::after { content: \"}\" }\n.pageno::after { content: counter(page) }\n";
        assertEquals("td:first-child::after { content: \"}\" }\n", UnusedStyleRules.prune(css, TEXT_ONLY));
    }

    @Test
    void aRuleWithASelectorOutsideTheGrammarIsKeptAsWritten() {
        // One selector the renderer might refuse can make it drop the whole rule: cutting the others
        // out of such a list could change what applies, so the list stays whole.
        for (String prelude : new String[] {"input, td:not(.x)", "input, p ~ td", "input, svg|rect", "input, td:nth-child(2n + 1)",
            "input, td::first-line", "input, p:lang(en)", "input,", "input, > td"}) {
            String css = prelude + " { color: red }";
            assertEquals(prelude + " { color: red }\n", UnusedStyleRules.prune(css, TEXT_ONLY), prelude);
        }
        assertNull(UnusedStyleRules.mayMatch("p ~ td", TEXT_ONLY));
        assertEquals(Boolean.FALSE, UnusedStyleRules.mayMatch("form input[type=text]", TEXT_ONLY));
        assertEquals(Boolean.TRUE, UnusedStyleRules.mayMatch("*", TEXT_ONLY));
    }

    @Test
    void atRulesStayAsWrittenAndCommentsAndSpaceBetweenRulesGo() {
        String css = "/* head */ @page { size: A4; @top-center { content: element(runHead) } }\n"
                + "@media screen { input { color: red } }\n@font-face { font-family: x; src: url(a.ttf) }\n"
                + "/* between */\ninput { color: red }\ntd{color:blue}";
        assertEquals("@page { size: A4; @top-center { content: element(runHead) } }\n@media screen { input { color: red } }\n"
                + "@font-face { font-family: x; src: url(a.ttf) }\ntd {color:blue}\n", UnusedStyleRules.prune(css, TEXT_ONLY));
    }

    @Test
    void bracesAndSemicolonsInStringsAndCommentsDoNotEndARule() {
        String css = "@import /* ; } */ url(\"a;b.css\");\ntd { content: \"a\\\"}\" /* } */ }\ninput { content: '}' }\n";
        assertEquals("@import /* ; } */ url(\"a;b.css\");\ntd { content: \"a\\\"}\" /* } */ }\n",
                UnusedStyleRules.prune(css, TEXT_ONLY));
    }

    @Test
    void whatTheRenderersLexerReadsOtherwiseIsKeptOrLeftWhole() {
        // Found by review, each confirmed against the renderer's PDF bytes (cut against whole sheets).
        // A CDC between rules is skipped by the renderer: "-->" is no element name here.
        assertEquals("--> td { color: red }\n", UnusedStyleRules.prune("--> td { color: red }", TEXT_ONLY));
        // Selectors the renderer refuses, dropping their whole rule: the list stays whole.
        for (String prelude : new String[] {".1x, td", "--q, td", "-1q, td", "#1x, td", "[data-q=1], td"}) {
            assertEquals(prelude + " { color: red }\n", UnusedStyleRules.prune(prelude + " { color: red }", TEXT_ONLY), prelude);
        }
        // An unquoted url(...) is one token, whatever it holds.
        assertEquals("td { color: red }\n", UnusedStyleRules.prune(".nope { background: url(a/*) } td { color: red }", TEXT_ONLY));
        assertEquals("", UnusedStyleRules.prune(".nope { background: url(x}td{color:red;x:y) }", TEXT_ONLY));
        String quoted = "td { background: url(a\"b) } input { }";
        assertEquals(quoted, UnusedStyleRules.prune(quoted, TEXT_ONLY));
        // Only CSS's own white space separates: U+3000 is a name character to the renderer.
        assertEquals("\u3000td { color: red }\n", UnusedStyleRules.prune("p { margin: 0 }\u3000td { color: red }", TEXT_ONLY));
        assertEquals("td\u3000 { color: red }\n", UnusedStyleRules.prune("td\u3000{ color: red }", TEXT_ONLY));
        // A carriage return ends a string, as a line feed does.
        String cr = ".nope { content: \"a\r} td { color: red } x\"; }";
        assertEquals(cr, UnusedStyleRules.prune(cr, TEXT_ONLY));
    }

    @Test
    void classNamesAreSplitWhereTheRendererSplitsThem() {
        StyleVocabulary words = StyleVocabulary.of(PdfRenderer.parse(
                "<html xmlns=\"http://www.w3.org/1999/xhtml\"><body><p class=\"a\u3000b\tc\">x</p></body></html>"));
        assertEquals(Set.of("a", "b", "c"), words.classes());
    }

    @Test
    void sheetsTooLargeForTheRenderersOrderKeysAreLeftWhole() {
        String page = "<html xmlns=\"http://www.w3.org/1999/xhtml\"><head><style>%s</style></head><body><p>x</p></body></html>";
        assertTrue(new PrunedStyleHandler(PdfRenderer.parse(String.format(page, "input { color: red }"))).cuts());
        String huge = "#f," .repeat(PrunedStyleHandler.MAX_SHEET_CHARS / 3) + "#f { color: blue }";
        assertFalse(new PrunedStyleHandler(PdfRenderer.parse(String.format(page, huge))).cuts());
    }

    @Test
    void aSheetThatDoesNotScanIsLeftToTheRenderersOwnRecovery() {
        for (String css : new String[] {"input { color: red", "input { content: \"open\n}", "/* open", "input, td /* x */ { }",
            "input; td { }", "} input { }", "input, td.\\31 x { color: red }"}) {
            assertEquals(css, UnusedStyleRules.prune(css, TEXT_ONLY), css);
        }
    }
}
