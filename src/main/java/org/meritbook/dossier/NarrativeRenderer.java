package org.meritbook.dossier;

import java.util.ArrayList;
import java.util.List;
import org.commonmark.ext.gfm.tables.TablesExtension;
import org.commonmark.node.AbstractVisitor;
import org.commonmark.node.Code;
import org.commonmark.node.Document;
import org.commonmark.node.Heading;
import org.commonmark.node.Image;
import org.commonmark.node.Node;
import org.commonmark.node.Text;
import org.commonmark.parser.Parser;
import org.commonmark.renderer.html.HtmlRenderer;

/**
 * Notebook narrative (CommonMark) to XHTML that cannot carry markup from the notebook: raw HTML is
 * escaped, unsafe link schemes dropped, images replaced by their description (a dossier never
 * fetches anything), and headings moved below the dossier's own heading levels.
 */
final class NarrativeRenderer {
    /** Narrative "#" becomes h3: h1 and h2 belong to the dossier's chapters and their parts. */
    private static final int HEADING_SHIFT = 2;

    private final Parser parser;
    private final HtmlRenderer renderer;

    NarrativeRenderer() {
        List<org.commonmark.Extension> ext = List.of(TablesExtension.create());
        parser = Parser.builder().extensions(ext).build();
        renderer = HtmlRenderer.builder().extensions(ext).escapeHtml(true).sanitizeUrls(true).build();
    }

    /** The top-level blocks of a narrative, detached so that they can be regrouped. */
    List<Node> blocks(String markdown) {
        Node doc = parser.parse(markdown);
        List<Node> out = new ArrayList<>();
        Node n = doc.getFirstChild();
        while (n != null) {
            Node next = n.getNext();
            n.unlink();
            out.add(n);
            n = next;
        }
        return out;
    }

    Markup render(List<Node> blocks) {
        Document doc = new Document();
        blocks.forEach(doc::appendChild);
        doc.accept(new Sanitizer());
        return new Markup(renderer.render(doc));
    }

    /** The plain text of a heading block, or null when the block is not a heading. */
    static String headingText(Node block) {
        if (!(block instanceof Heading)) {
            return null;
        }
        StringBuilder b = new StringBuilder();
        block.accept(new AbstractVisitor() {
            @Override
            public void visit(Text text) {
                b.append(text.getLiteral());
            }

            @Override
            public void visit(Code code) {
                b.append(code.getLiteral());
            }
        });
        return b.toString().strip();
    }

    private static final class Sanitizer extends AbstractVisitor {
        @Override
        public void visit(Heading heading) {
            heading.setLevel(Math.min(6, heading.getLevel() + HEADING_SHIFT));
            visitChildren(heading);
        }

        @Override
        public void visit(Image image) {
            StringBuilder alt = new StringBuilder();
            image.accept(new AbstractVisitor() {
                @Override
                public void visit(Text text) {
                    alt.append(text.getLiteral());
                }
            });
            image.insertBefore(new Text("[image not embedded: " + alt + "]"));
            image.unlink();
        }
    }
}
