package org.lpzplanner.bench;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.locationtech.jts.geom.Geometry;
import org.lpzplanner.engine.exposure.AnalysisOptions;
import org.lpzplanner.engine.exposure.ExposureAnalysis;
import java.util.Locale;
import java.util.stream.Stream;
import org.lpzplanner.engine.design.proposal.AirTerminationProposer;
import org.lpzplanner.engine.design.proposal.Proposal;
import org.lpzplanner.engine.design.proposal.ProposalMonitor;
import org.lpzplanner.engine.design.proposal.ProposalOptions;
import org.lpzplanner.engine.io.SiteReader;
import org.lpzplanner.engine.model.ProtectionLevel;
import org.lpzplanner.engine.model.Site;
import org.lpzplanner.engine.model.Structure;
import org.lpzplanner.engine.model.SphereSpec;

/**
 * Proposal time and part counts on every sample site at every level, rods of 0.5, 1, 1.5, 2 and
 * 3 m, against the regular layout; where walls rise above the sphere radius, also with the walls
 * and rims of those structures accepted (no roof part can cover them), and, when that is still not
 * complete, with roof-edge conductors allowed too. A plain main (run with {@code scripts/benchmark proposal});
 * prints a Markdown table. Arguments: optional sample file names and levels (I to IV) to restrict the run.
 */
public final class ProposalBenchmark {

    private static void row(Path f, String level, Proposal p) {
        System.out.printf(Locale.ROOT, "| %s | %s | %d | %d | %.0f %% | %s | %s | %d | %d | %d | %.1f |%n",
                f.getFileName(), level, p.count(), p.regularLayoutCount(), 100 * p.shareOfRegular(),
                p.complete() ? "yes" : "no", p.left().isEmpty() ? "-" : p.left(), p.beyondReach(), p.rounds(),
                p.candidates(), p.elapsedMillis() / 1000.0);
    }

    public static void main(String[] args) throws Exception {
        List<Path> files;
        try (Stream<Path> s = Files.list(Path.of("sample-sites"))) {
            files = s.filter(f -> !f.toString().endsWith(".md")).sorted().toList();
        }
        List<String> only = new ArrayList<>();
        List<String> levels = new ArrayList<>();
        for (String a : args) {
            (a.matches("I{1,3}|IV") ? levels : only).add(a);
        }
        if (levels.isEmpty()) {
            levels = List.of("I", "II", "III", "IV");
        }
        System.out.println("| site | level | proposed parts | regular layout | share | complete | left (points) | beyond reach | rounds | candidates | seconds |");
        System.out.println("|---|---|---|---|---|---|---|---|---|---|---|");
        for (Path f : files) {
            if (!only.isEmpty() && !only.contains(f.getFileName().toString())) {
                continue;
            }
            Site site = SiteReader.read(f).site();
            for (String lv : levels) {
                ProtectionLevel level = ProtectionLevel.parse(lv);
                SphereSpec sphere = SphereSpec.of(level);
                ProposalOptions options = ProposalOptions.rods(sphere, List.of(0.5, 1.0, 1.5, 2.0, 3.0));
                // structures reached from the side above R need side air-termination whatever
                // stands on their roofs: their walls and rims are accepted as a designer would
                List<Geometry> high = new ArrayList<>();
                var bare = ExposureAnalysis.analyze(site, AnalysisOptions.of(sphere));
                for (Structure st : site.structures()) {
                    if (bare.facades().stream().anyMatch(b -> b.ownerId().equals(st.id()) && b.top() > sphere.radius())) {
                        high.add(st.footprint().getBoundary());
                    }
                }
                if (!high.isEmpty()) {
                    Proposal withRods = AirTerminationProposer.propose(site, options.withAccepted(high), ProposalMonitor.NONE);
                    row(f, level + " (upper walls and rims above R accepted)", withRods);
                    if (!withRods.complete()) {
                        row(f, level + " (same, roof-edge conductors allowed)", AirTerminationProposer.propose(site,
                                new ProposalOptions(sphere, options.rodHeights(), true, false, List.of(), List.of(), high,
                                        null), ProposalMonitor.NONE));
                    }
                }
                row(f, level.name(), AirTerminationProposer.propose(site, options, ProposalMonitor.NONE));
            }
        }
    }
}
