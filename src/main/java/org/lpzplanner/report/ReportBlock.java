package org.lpzplanner.report;

import java.util.List;
import org.lpzplanner.drawing.PlanDrawing;
import org.lpzplanner.sections.SiteSection;

/**
 * One piece of a report's content, in reading order. The content model knows nothing of pages: the
 * renderer decides where each block goes, wraps text, splits long tables and numbers the pages.
 */
public interface ReportBlock {

    /** A heading; {@code level} 1 starts a new page, 2 is a subheading. */
    record Heading(String text, int level) implements ReportBlock {
    }

    /** A paragraph of running text, wrapped to the page width. */
    record Paragraph(String text) implements ReportBlock {
    }

    /** Label and value pairs, two columns. */
    record Facts(List<Fact> facts) implements ReportBlock {
        public Facts {
            facts = List.copyOf(facts);
        }
    }

    /** One labelled value. */
    record Fact(String label, String value) {
    }

    /** A boxed list of cautions. */
    record CautionsBox(String title, List<String> lines) implements ReportBlock {
        public CautionsBox {
            lines = List.copyOf(lines);
        }
    }

    /** Blank fields for the licensed reviewer to fill in by hand. */
    record ReviewBlock(String title, List<String> fields, String approvalText) implements ReportBlock {
        public ReviewBlock {
            fields = List.copyOf(fields);
        }
    }

    /** The plan drawing: overview to a stated scale, then detail tiles when the site is large. */
    record Plan(PlanDrawing drawing) implements ReportBlock {
    }

    /** A vertical section with its title and what it passes through. */
    record Section(String title, String caption, SiteSection section) implements ReportBlock {
    }
}
