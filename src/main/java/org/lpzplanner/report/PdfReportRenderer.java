package org.lpzplanner.report;

import java.awt.Color;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.Calendar;
import java.util.List;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDDocumentInformation;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.PDPageContentStream;

/**
 * Lays a {@link ReportContent} out on A4 pages with PDFBox: headings, wrapped paragraphs, label and
 * value lists, schedules split over pages with their headings repeated, the plan and section
 * drawings as vector graphics, the cautions box and the review block; then the footer of every page
 * (the cautions, the site and revision, "Page n of m"). Nothing is drawn below the footer line or
 * beyond the margins: text wraps, long words split, and a table row taller than a page is cut
 * with a mark. Stateless; each call builds its own document.
 */
public final class PdfReportRenderer {

    static final Color TEXT = new Color(0x1a, 0x1a, 0x1a);
    static final Color MUTED = new Color(0x55, 0x55, 0x55);
    static final Color RULE = new Color(0x99, 0x99, 0x99);
    static final Color HEADER_FILL = new Color(0xe4, 0xe7, 0xeb);
    static final Color CAUTION_FILL = new Color(0xfd, 0xf3, 0xe1);
    static final Color CAUTION_EDGE = new Color(0xb3, 0x6b, 0x00);

    static final float BODY = 9.5f;
    static final float BODY_LEADING = 12.5f;
    static final float TABLE = 7.6f;
    static final float TABLE_LEADING = 9.4f;
    static final float FOOTER = 6.2f;
    static final float FOOTER_LEADING = 7.4f;

    private PdfReportRenderer() {
    }

    /** The report as PDF bytes. */
    public static byte[] render(ReportContent content) {
        try (PDDocument document = new PDDocument()) {
            PdfFonts fonts = new PdfFonts(document);
            List<String> footerLines = footerLines(fonts, content);
            float footerHeight = footerLines.size() * FOOTER_LEADING + FOOTER_LEADING * 2 + 10;
            PdfPages pages = new PdfPages(document, fonts, footerHeight);
            pages.newPage();
            for (ReportBlock block : content.blocks()) {
                place(pages, block);
            }
            pages.finish();
            footers(document, fonts, pages.pages, content, footerLines);
            PDDocumentInformation info = document.getDocumentInformation();
            info.setTitle(fonts.safe(content.title() + " - " + content.footerTitle()));
            info.setCreator("LPZ Planner");
            info.setCreationDate(Calendar.getInstance());
            ByteArrayOutputStream bytes = new ByteArrayOutputStream();
            document.save(bytes);
            return bytes.toByteArray();
        } catch (IOException e) {
            throw new UncheckedIOException("the report could not be written", e);
        }
    }

    private static void place(PdfPages p, ReportBlock block) {
        if (block instanceof ReportBlock.Heading h) {
            heading(p, h);
        } else if (block instanceof ReportBlock.Paragraph para) {
            paragraph(p, para.text(), BODY, BODY_LEADING, TEXT);
            p.y -= 4;
        } else if (block instanceof ReportBlock.Facts f) {
            facts(p, f);
        } else if (block instanceof ReportBlock.CautionsBox c) {
            cautions(p, c);
        } else if (block instanceof Schedule s) {
            PdfTables.schedule(p, s);
        } else if (block instanceof ReportBlock.Plan plan) {
            PdfPlanPainter.paint(p, plan.drawing());
        } else if (block instanceof ReportBlock.Section s) {
            PdfSectionPainter.paint(p, s);
        } else if (block instanceof ReportBlock.ReviewBlock r) {
            review(p, r);
        } else {
            throw new IllegalArgumentException("no layout for " + block.getClass().getSimpleName());
        }
    }

    private static void heading(PdfPages p, ReportBlock.Heading h) {
        if (h.level() <= 1) {
            if (!p.atTop()) {
                p.newPage();
            }
            List<String> lines = PdfPages.wrap(p.fonts, h.text(), 16, PdfPages.CONTENT_WIDTH);
            for (String line : lines) {
                p.text(line, PdfPages.MARGIN, p.y - 16, 16, true, TEXT);
                p.y -= 20;
            }
            p.line(PdfPages.MARGIN, p.y, PdfPages.MARGIN + PdfPages.CONTENT_WIDTH, p.y, RULE, 0.6f);
            p.y -= 12;
        } else {
            List<String> lines = PdfPages.wrap(p.fonts, h.text(), 11.5f, PdfPages.CONTENT_WIDTH);
            p.ensure(lines.size() * 15 + 40);
            p.y -= 4;
            for (String line : lines) {
                p.text(line, PdfPages.MARGIN, p.y - 11.5f, 11.5f, true, TEXT);
                p.y -= 15;
            }
            p.y -= 3;
        }
    }

    static void paragraph(PdfPages p, String text, float size, float leading, Color colour) {
        for (String line : PdfPages.wrap(p.fonts, text, size, PdfPages.CONTENT_WIDTH)) {
            p.ensure(leading);
            p.text(line, PdfPages.MARGIN, p.y - size, size, false, colour);
            p.y -= leading;
        }
    }

    private static void facts(PdfPages p, ReportBlock.Facts facts) {
        float labelWidth = 150;
        float valueWidth = PdfPages.CONTENT_WIDTH - labelWidth;
        for (ReportBlock.Fact f : facts.facts()) {
            List<String> values = PdfPages.wrap(p.fonts, f.value(), BODY, valueWidth - 4);
            boolean blank = f.value() == null || f.value().isBlank();
            float height = Math.max(1, values.size()) * BODY_LEADING + (blank ? 6 : 3);
            p.ensure(height);
            p.text(f.label(), PdfPages.MARGIN, p.y - BODY, BODY, true, MUTED);
            float y = p.y;
            for (String line : values) {
                p.text(line, PdfPages.MARGIN + labelWidth, y - BODY, BODY, false, TEXT);
                y -= BODY_LEADING;
            }
            if (blank) {
                // A line to write on by hand.
                p.line(PdfPages.MARGIN + labelWidth, p.y - BODY - 3, PdfPages.MARGIN + PdfPages.CONTENT_WIDTH,
                        p.y - BODY - 3, RULE, 0.5f);
            }
            p.y -= height;
        }
        p.y -= 6;
    }

    private static void cautions(PdfPages p, ReportBlock.CautionsBox box) {
        float inner = PdfPages.CONTENT_WIDTH - 20;
        List<List<String>> items = new ArrayList<>();
        int lines = 0;
        for (String caution : box.lines()) {
            List<String> wrapped = PdfPages.wrap(p.fonts, caution, 8.8f, inner - 10);
            items.add(wrapped);
            lines += wrapped.size();
        }
        float height = 26 + lines * 11.2f + box.lines().size() * 2 + 6;
        p.ensure(height + 8);
        float top = p.y - 4;
        p.fillRect(PdfPages.MARGIN, top - height, PdfPages.CONTENT_WIDTH, height, CAUTION_FILL);
        p.strokeRect(PdfPages.MARGIN, top - height, PdfPages.CONTENT_WIDTH, height, CAUTION_EDGE, 1.2f);
        p.text(box.title(), PdfPages.MARGIN + 10, top - 16, 10.5f, true, CAUTION_EDGE);
        float y = top - 30;
        for (List<String> item : items) {
            p.text("•", PdfPages.MARGIN + 10, y - 8.8f, 8.8f, false, TEXT);
            for (String line : item) {
                p.text(line, PdfPages.MARGIN + 20, y - 8.8f, 8.8f, false, TEXT);
                y -= 11.2f;
            }
            y -= 2;
        }
        p.y = top - height - 10;
    }

    private static void review(PdfPages p, ReportBlock.ReviewBlock r) {
        float rowHeight = 30;
        float height = 24 + r.fields().size() * rowHeight + 40 + 150;
        p.ensure(height);
        float top = p.y;
        p.strokeRect(PdfPages.MARGIN, top - height, PdfPages.CONTENT_WIDTH, height, TEXT, 0.8f);
        p.text(r.title(), PdfPages.MARGIN + 8, top - 16, 11, true, TEXT);
        float y = top - 24;
        for (String field : r.fields()) {
            y -= rowHeight;
            p.text(field, PdfPages.MARGIN + 8, y + 6, BODY, false, MUTED);
            p.line(PdfPages.MARGIN + 110, y + 4, PdfPages.MARGIN + PdfPages.CONTENT_WIDTH - 10, y + 4, RULE, 0.5f);
        }
        y -= 26;
        float x = PdfPages.MARGIN + 8;
        for (String option : r.approvalText().split("\\s+/\\s+")) {
            p.strokeRect(x, y, 9, 9, TEXT, 0.7f);
            p.text(option, x + 14, y + 1.5f, BODY, false, TEXT);
            x += 20 + p.fonts.width(p.fonts.safe(option), BODY) + 14;
        }
        y -= 18;
        p.text("Comments", PdfPages.MARGIN + 8, y, BODY, false, MUTED);
        p.strokeRect(PdfPages.MARGIN + 8, top - height + 8, PdfPages.CONTENT_WIDTH - 16, y - 6 - (top - height + 8),
                RULE, 0.5f);
        p.y = top - height - 10;
    }

    /** The cautions of the footer, wrapped to the page width. */
    private static List<String> footerLines(PdfFonts fonts, ReportContent content) {
        List<String> lines = new ArrayList<>();
        for (String caution : content.cautions()) {
            lines.addAll(PdfPages.wrap(fonts, caution, FOOTER, PdfPages.CONTENT_WIDTH));
        }
        return lines;
    }

    private static void footers(PDDocument document, PdfFonts fonts, List<PDPage> pages, ReportContent content,
            List<String> cautionLines) throws IOException {
        int total = pages.size();
        for (int i = 0; i < total; i++) {
            try (PDPageContentStream out = new PDPageContentStream(document, pages.get(i),
                    PDPageContentStream.AppendMode.APPEND, true, true)) {
                float y = PdfPages.MARGIN + cautionLines.size() * FOOTER_LEADING + FOOTER_LEADING * 2 + 4;
                out.setStrokingColor(RULE);
                out.setLineWidth(0.5f);
                out.moveTo(PdfPages.MARGIN, y);
                out.lineTo(PdfPages.MARGIN + PdfPages.CONTENT_WIDTH, y);
                out.stroke();
                y -= FOOTER_LEADING + 1;
                String page = "Page " + (i + 1) + " of " + total;
                float pageWidth = fonts.width(fonts.safe(page), 7);
                List<String> title = PdfPages.wrap(fonts, content.footerTitle(), 7,
                        PdfPages.CONTENT_WIDTH - pageWidth - 16);
                PdfPages.text(out, fonts, title.get(0) + (title.size() > 1 ? " …" : ""), PdfPages.MARGIN, y, 7, false,
                        TEXT);
                PdfPages.text(out, fonts, page, PdfPages.MARGIN + PdfPages.CONTENT_WIDTH - pageWidth, y, 7, true,
                        TEXT);
                y -= FOOTER_LEADING + 1;
                for (String line : cautionLines) {
                    PdfPages.text(out, fonts, line, PdfPages.MARGIN, y, FOOTER, false, MUTED);
                    y -= FOOTER_LEADING;
                }
            }
        }
    }
}
