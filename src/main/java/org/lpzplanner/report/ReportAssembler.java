package org.lpzplanner.report;

import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.lpzplanner.common.Cautions;
import org.lpzplanner.common.Formats;
import org.lpzplanner.common.ReportSection;
import org.lpzplanner.engine.envelope.EnvelopeField;
import org.lpzplanner.engine.envelope.EnvelopeOp;
import org.lpzplanner.engine.geom.SiteSurface;
import org.lpzplanner.engine.geom.SiteSurfaceBuilder;
import org.lpzplanner.engine.model.ProtectionLevel;
import org.lpzplanner.engine.model.Site;
import org.lpzplanner.sections.SiteSection;
import org.lpzplanner.sites.SiteFiles;
import org.lpzplanner.sites.StructureRow;

/**
 * Assembles the content of a report from one {@link ReportSource}: the cover with the status and the
 * cautions, the method and inputs, the plan drawing, the sections (saved cuts, then one automatic cut
 * per structure), the schedules of {@link ReportParts} and the review block. Everything comes from
 * the stored file and result of the revision; only the section envelopes are computed again from
 * the stored file at the stored sphere and resolution (the engine is deterministic, so they come out
 * the same every time).
 */
public final class ReportAssembler {

    /** Standard and edition the method follows. */
    public static final String STANDARD = "IEC 62305-3:2010, rolling sphere method (5.2.2, Table 2, Annex A)";

    /** Heading of the sections that do not belong to the revision. */
    public static final String APPENDIX = "Appendix: as at printing";

    private static final DateTimeFormatter DATE = DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm 'UTC'", Locale.ROOT)
            .withZone(ZoneOffset.UTC);

    private ReportAssembler() {
    }

    /** Assembles a report, computing the envelope from the stored file. */
    public static ReportContent assemble(ReportSource source) {
        return assemble(source, null);
    }

    /**
     * Assembles a report.
     *
     * @param field the envelope of the source's site at its sphere and resolution when the caller
     *              has it (the command line, right after analysing), or null to compute it
     */
    public static ReportContent assemble(ReportSource source, EnvelopeField field) {
        return assemble(source, field, List.of());
    }

    /**
     * Assembles a report with sections other features supply as plain tables (for example the risk
     * estimate), printed after the schedules.
     */
    public static ReportContent assemble(ReportSource source, EnvelopeField field, List<ReportSection> more) {
        return assemble(source, field, StoredDesign.NONE, more);
    }

    /**
     * Assembles a report with the site's stored design data (edited down-conductors, metal
     * installations: they enter the schedules, marked "as stored … when printed") and sections other
     * features supply, printed in an appendix after the schedules. A section without columns prints
     * as its title and notes only (for example a section left out, saying why).
     */
    public static ReportContent assemble(ReportSource source, EnvelopeField field, StoredDesign design,
            List<ReportSection> more) {
        Site site = SiteFiles.read(source.sourceText(), source.sourceName()).site();
        SiteSurface surface = SiteSurfaceBuilder.build(site);
        EnvelopeField envelope = field != null ? field
                : EnvelopeOp.compute(surface, source.sphere().radius(), source.resolution());
        ReportFacts facts = ReportFacts.of(source, site, surface, envelope, StoredResult.read(source.resultGeoJson()),
                design);
        List<ReportBlock> blocks = new ArrayList<>();
        cover(facts, blocks, !more.isEmpty());
        method(facts, blocks);
        blocks.add(new ReportBlock.Heading("Plan", 1));
        blocks.add(new ReportBlock.Plan(PlanDrawings.of(facts)));
        sections(facts, blocks);
        blocks.add(new ReportBlock.Heading("Schedules", 1));
        for (ReportPart part : ReportParts.SCHEDULES) {
            blocks.addAll(part.blocks(facts));
        }
        if (!more.isEmpty()) {
            blocks.add(new ReportBlock.Heading(APPENDIX, 1));
            if (design.readAt() != null) {
                blocks.add(new ReportBlock.Paragraph("What follows comes from the site's data " + design.asStored()
                        + ", not from the analysis revision: it can differ when the same revision is printed again"
                        + " after those data changed."));
            }
        }
        for (ReportSection section : more) {
            if (section.columns().isEmpty()) {
                blocks.add(new ReportBlock.Heading(section.title(), 2));
                section.notes().forEach(n -> blocks.add(new ReportBlock.Paragraph(n)));
                continue;
            }
            blocks.add(new Schedule(section.title(), section.columns(),
                    section.columns().stream().map(c -> 1.0).toList(), section.rows(), section.notes()));
        }
        blocks.add(new ReportBlock.Heading("Review and approval", 1));
        blocks.add(reviewBlock());
        String footer = source.siteName() + " · " + revisionText(source) + " · " + levelText(source);
        return new ReportContent("Lightning-protection assessment", footer, Cautions.lines(), blocks);
    }

    /**
     * The cover's status line. While a model warning stands, accepted or not, it gives no verdict of
     * protection: it never says that no exposed items remain.
     */
    static String status(ReportFacts facts) {
        int accepted = facts.acceptedExposedCount();
        int remaining = facts.exposedItems().size() - accepted;
        boolean roofs = !facts.stored().roofAreas().isEmpty();
        String exposure;
        if (remaining == 0 && !roofs) {
            exposure = "every roof area, edge and corner, and every facade band needing lateral air-termination"
                    + " (IEC 62305-3:2010 5.2.3), is protected or accepted by the designer (" + accepted + " accepted).";
        } else {
            exposure = remaining + " edge, corner or facade band item" + (remaining == 1 ? "" : "s")
                    + (roofs ? " and exposed roof areas" : "") + " need air-termination or the designer's acceptance ("
                    + accepted + " accepted).";
        }
        List<StoredResult.Warning> warnings = facts.stored().warnings();
        if (warnings.isEmpty()) {
            return (remaining == 0 && !roofs ? "No exposed items remain: " : "Exposed items remain: ") + exposure;
        }
        String others = remaining == 0 && !roofs
                ? "no other exposed roof area, edge, corner or facade band remains unaccepted (" + accepted
                        + " accepted)."
                : exposure;
        long acceptedWarnings = warnings.stream().filter(w -> facts.source().accepted().containsKey(w.item().key()))
                .count();
        String parts = String.join(", ", warnings.stream().map(w -> w.item().owner()).distinct().toList());
        return "No verdict of full protection: " + warnings.size() + " model warning" + (warnings.size() == 1
                ? " stands" : "s stand") + " (" + parts + "; see the schedule of model warnings)"
                + (acceptedWarnings == 0 ? "" : ", " + acceptedWarnings + " accepted by the designer, which records"
                        + " the answer but does not lift the warning")
                + ". Other findings: " + others;
    }

    private static void cover(ReportFacts facts, List<ReportBlock> blocks, boolean appendix) {
        ReportSource s = facts.source();
        String status = status(facts);
        blocks.add(new ReportBlock.Heading("Lightning-protection assessment", 1));
        blocks.add(new ReportBlock.Facts(List.of(
                new ReportBlock.Fact("Site", s.siteName()),
                new ReportBlock.Fact("Address", s.cover().address()),
                new ReportBlock.Fact("Protection level", levelText(s)),
                new ReportBlock.Fact("Method", STANDARD),
                new ReportBlock.Fact("Revision", revisionText(s)),
                new ReportBlock.Fact("Analysed", DATE.format(s.analysedAt())),
                new ReportBlock.Fact("Designer", s.cover().designer()),
                new ReportBlock.Fact("Site file", s.sourceName()),
                new ReportBlock.Fact("Site file SHA-256", s.inputsSha256()),
                new ReportBlock.Fact("Status", status))));
        blocks.add(new ReportBlock.Paragraph(coverNote(s.cover())));
        blocks.add(new ReportBlock.CautionsBox("Read before use", Cautions.lines()));
        blocks.add(new ReportBlock.Heading("Findings", 2));
        List<org.lpzplanner.analysis.ReviewItems.Item> exposed = facts.exposedItems();
        long edges = exposed.stream().filter(i -> !i.kind().equals("corner") && !i.kind().equals("facade-band"))
                .count();
        long corners = exposed.stream().filter(i -> i.kind().equals("corner")).count();
        long bands = exposed.stream().filter(i -> i.kind().equals("facade-band")).count();
        double roofArea = facts.stored().roofAreas().values().stream().mapToDouble(Double::doubleValue).sum();
        int downConductors = facts.downConductors().stream().mapToInt(d -> d.count()).sum();
        long editedBuildings = java.util.stream.IntStream.range(0, facts.downConductors().size())
                .filter(facts::edited).count();
        blocks.add(new ReportBlock.Facts(List.of(
                new ReportBlock.Fact("Structures", String.valueOf(facts.site().structures().size())),
                new ReportBlock.Fact("Exposed roof area", Formats.area(roofArea) + " m² (plan)"),
                new ReportBlock.Fact("Exposed items", edges + " edges, " + corners + " corners, " + bands
                        + " facade bands needing lateral air-termination; " + facts.acceptedExposedCount()
                        + " accepted"),
                new ReportBlock.Fact("Negligible facade bands", SideFlashSchedule.negligible(facts).size()
                        + " where flashes to the side are negligible (IEC 62305-3:2010 5.2.3: structures lower than"
                        + " 60 m, or below the upper 20 % of taller ones; listed apart, not exposed)"),
                new ReportBlock.Fact("Model warnings", warningFinding(facts)),
                new ReportBlock.Fact("Air-termination parts", facts.partNumbers().size() + " ("
                        + facts.stored().intercepting().size() + " intercepting)"),
                new ReportBlock.Fact("Down-conductors", downConductors + (editedBuildings == 0
                        ? " planned at the level's typical spacing"
                        : ", placed by the designer on " + editedBuildings + " of "
                                + facts.downConductors().size() + " buildings")))));
        blocks.add(new ReportBlock.Paragraph("Contents: method and inputs; plan to scale; sections; schedules of"
                + " air-termination parts, " + (facts.stored().warnings().isEmpty() ? "" : "model warnings, ")
                + "exposed items, " + (SideFlashSchedule.negligible(facts).isEmpty() ? ""
                        : "facade bands where flashes to the side are negligible, ")
                + "down-conductors and separation distances; bill of"
                + " quantities;" + (appendix ? " appendix (risk estimate);" : "") + " review and approval."));
    }

    /** The findings line of the model warnings: none, or how many, each part and its height. */
    private static String warningFinding(ReportFacts facts) {
        List<StoredResult.Warning> warnings = facts.stored().warnings();
        if (warnings.isEmpty()) {
            return "none";
        }
        List<String> each = new ArrayList<>();
        for (StoredResult.Warning w : warnings) {
            Double above = w.item().heightAboveSurface();
            each.add(w.item().owner() + ", up to " + (above == null ? "?" : Formats.height(above)) + " m above the surface"
                    + " beneath it (" + ModelWarningSchedule.kind(w.item().kind()) + ", E" + w.item().number() + ")");
        }
        return warnings.size() + ": " + String.join("; ", each) + ". No verdict of full protection while a"
                + " warning stands.";
    }

    /**
     * Where the cover's address and designer come from. They belong to the site, not to the
     * revision, so a stored report says when they were read; empty ones keep their line to fill in.
     */
    static String coverNote(ReportSource.Cover cover) {
        boolean address = !cover.address().isEmpty();
        boolean designer = !cover.designer().isEmpty();
        String origin = cover.readAt() == null ? "as given on the command line"
                : "as stored for the site on " + DATE.format(cover.readAt()) + " when this report was printed"
                        + " (site data, not part of the analysis revision)";
        if (address && designer) {
            return "Address and designer " + origin + ".";
        }
        String missing = cover.readAt() == null ? "not given" : "not stored for the site";
        if (!address && !designer) {
            return "Address and designer " + missing + ": write them on the lines above.";
        }
        return (address ? "Address " : "Designer ") + origin + "; " + (address ? "designer " : "address ") + missing
                + ": write it on the line above.";
    }

    private static void method(ReportFacts facts, List<ReportBlock> blocks) {
        ReportSource s = facts.source();
        ProtectionLevel level = s.sphere().level();
        blocks.add(new ReportBlock.Heading("Method and inputs", 1));
        blocks.add(new ReportBlock.Paragraph("A sphere of radius R is rolled over every structure, rooftop object"
                + " and air-termination part of the site in three dimensions; whatever it can touch can be struck"
                + " (LPZ 0A), whatever lies below the surface its centre can reach less R is protected against"
                + " direct strikes (LPZ 0B). The engine computes that protection envelope on a grid and refines"
                + " it exactly where a decision needs it; every value it reports is at most the tolerance below"
                + " the true envelope and never above it, so every decision errs toward \"exposed\"."));
        blocks.add(new ReportBlock.Facts(List.of(
                new ReportBlock.Fact("Standard followed", STANDARD),
                new ReportBlock.Fact("Protection level", level.name()),
                new ReportBlock.Fact("Sphere radius R", Formats.radius(s.sphere().radius()) + " m"
                        + (s.sphere().isCustomRadius() ? " (custom; the level's own is "
                                + Formats.radius(level.sphereRadius()) + " m)" : " (IEC 62305-3:2010 Table 2)")),
                new ReportBlock.Fact("Mesh size of the level", Formats.length(level.meshSize()) + " m × "
                        + Formats.length(level.meshSize()) + " m (Table 2)"),
                new ReportBlock.Fact("Typical down-conductor spacing", Formats.length(level.downConductorSpacing())
                        + " m (Table 4)"),
                new ReportBlock.Fact("Minimum peak current intercepted", Formats.oneDecimal(level.minPeakCurrentKa())
                        + " kA (IEC 62305-1:2010)"),
                new ReportBlock.Fact("Separation distance ki", String.valueOf(level.ki()) + " (Table 10)"),
                new ReportBlock.Fact("Grid resolution", Formats.length(s.resolution()) + " m"),
                new ReportBlock.Fact("Envelope tolerance", String.format(Locale.ROOT, "%.3f m", s.tolerance())))));
        blocks.add(new ReportBlock.Heading("Assumptions", 2));
        blocks.add(new ReportBlock.Paragraph("Every structure and rooftop object is solid from the ground up; no"
                + " sphere reaches under an overhang or a wire (exact while nothing overhangs by more than R)."
                + " The ground is flat at height 0. Heights, roof forms and parts are as the site file gives them;"
                + " nothing is inferred. Structures that touch or overlap form one solid. Where a conductor or"
                + " wire runs more than R above what lies beneath it, the analysis warns, naming it (see the"
                + " schedule of model warnings), and gives no verdict of full protection while the warning"
                + " stands. A sphere touches every wall taller than R from R up; by IEC 62305-3:2010 5.2.3 and"
                + " Annex A only the upper part of a building taller than 60 m (from 0.8 H, and everything above"
                + " 120 m) needs lateral air-termination, where H is the highest point of the structures that"
                + " touch or overlap; the rest of such bands is listed apart as negligible."));
        List<List<String>> rows = new ArrayList<>();
        for (StructureRow r : StructureRow.of(facts.site().structures())) {
            rows.add(List.of(r.id(), r.name(), r.footprintText(), r.heightText(), r.roof(),
                    r.ridgeHeight() == null ? "" : r.ridgeHeightText(), r.parapet() == null ? "" : r.parapetText(),
                    Formats.height(facts.site().structures().get(r.index()).topHeight())));
        }
        blocks.add(new Schedule("Structures", List.of("Id", "Name", "Footprint (m²)", "Wall top (m)", "Roof",
                "Ridge (m)", "Parapet (m)", "Top (m)"), List.of(0.6, 2.2, 1.1, 0.9, 0.7, 0.8, 0.8, 0.8), rows,
                List.of("Heights above ground.")));
    }

    private static void sections(ReportFacts facts, List<ReportBlock> blocks) {
        blocks.add(new ReportBlock.Heading("Sections", 1));
        for (ReportSource.Cut cut : facts.source().savedCuts()) {
            SiteSection section = SiteSection.cut(facts.surface(), facts.field(), cut.x1(), cut.y1(), cut.x2(),
                    cut.y2());
            blocks.add(new ReportBlock.Section("Saved cut: " + cut.name(), cutText(cut)
                    + " Saved for the site; drawn as stored when this report was printed.", section));
        }
        List<AutomaticCuts.StructureCut> cuts = AutomaticCuts.of(facts);
        if (facts.source().savedCuts().isEmpty() && cuts.isEmpty()) {
            blocks.add(new ReportBlock.Paragraph("No saved cuts, and no structure has an exposed point to cut"
                    + " through."));
        }
        // Sections are independent exact envelope queries (the field is thread-safe): sample them in
        // parallel, keeping the order.
        List<SiteSection> sections = cuts.parallelStream().map(c -> SiteSection.cut(facts.surface(), facts.field(),
                c.cut().x1(), c.cut().y1(), c.cut().x2(), c.cut().y2())).toList();
        for (int i = 0; i < cuts.size(); i++) {
            AutomaticCuts.StructureCut c = cuts.get(i);
            blocks.add(new ReportBlock.Section("Section through " + c.structure().name(), "Through its highest"
                    + " exposed point (" + Formats.coordinate(c.through().x()) + ", "
                    + Formats.coordinate(c.through().y()) + "), "
                    + cutText(c.cut()), sections.get(i)));
        }
    }

    private static String cutText(ReportSource.Cut cut) {
        return "from (" + Formats.coordinate(cut.x1()) + ", " + Formats.coordinate(cut.y1()) + ") to ("
                + Formats.coordinate(cut.x2()) + ", " + Formats.coordinate(cut.y2()) + "), local metres.";
    }

    private static ReportBlock reviewBlock() {
        return new ReportBlock.ReviewBlock("Licensed reviewer", List.of("Name", "Licence number", "Organisation",
                "Signature", "Date"), "Approved as drawn  /  Approved with the comments below  /  Not approved");
    }

    static String revisionText(ReportSource s) {
        return s.revision() > 0 ? "Revision " + s.revision() : "Unsaved analysis (command line)";
    }

    static String levelText(ReportSource s) {
        return "Protection level " + s.sphere().level().name() + ", R = " + Formats.radius(s.sphere().radius()) + " m";
    }
}
