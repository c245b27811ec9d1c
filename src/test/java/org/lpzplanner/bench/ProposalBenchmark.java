package org.lpzplanner.bench;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.stream.Stream;
import org.lpzplanner.engine.design.proposal.AirTerminationProposer;
import org.lpzplanner.engine.design.proposal.Proposal;
import org.lpzplanner.engine.design.proposal.ProposalMonitor;
import org.lpzplanner.engine.design.proposal.ProposalOptions;
import org.lpzplanner.engine.io.SiteReader;
import org.lpzplanner.engine.model.ProtectionLevel;
import org.lpzplanner.engine.model.Site;
import org.lpzplanner.engine.model.SphereSpec;

/**
 * Proposal time and part counts on every sample site at every level, rods of 0.5, 1, 1.5, 2 and
 * 3 m, against the regular layout. A plain main (run with {@code scripts/benchmark proposal});
 * prints a Markdown table. Arguments: optional sample file names to restrict the run.
 */
public final class ProposalBenchmark {

    public static void main(String[] args) throws Exception {
        List<Path> files;
        try (Stream<Path> s = Files.list(Path.of("sample-sites"))) {
            files = s.filter(f -> !f.toString().endsWith(".md")).sorted().toList();
        }
        List<String> only = List.of(args);
        List<String> levels = System.getProperty("levels") == null ? List.of("I", "II", "III", "IV")
                : List.of(System.getProperty("levels").split(","));
        System.out.println("| site | level | proposed parts | regular layout | share | complete | left (points) | beyond reach | rounds | candidates | seconds |");
        System.out.println("|---|---|---|---|---|---|---|---|---|---|---|");
        for (Path f : files) {
            if (!only.isEmpty() && !only.contains(f.getFileName().toString())) {
                continue;
            }
            Site site = SiteReader.read(f).site();
            for (String lv : levels) {
                ProtectionLevel level = ProtectionLevel.parse(lv);
                ProposalOptions options = ProposalOptions.rods(SphereSpec.of(level), List.of(0.5, 1.0, 1.5, 2.0, 3.0));
                Proposal p = AirTerminationProposer.propose(site, options, ProposalMonitor.NONE);
                System.out.printf(Locale.ROOT, "| %s | %s | %d | %d | %.0f %% | %s | %s | %d | %d | %d | %.1f |%n",
                        f.getFileName(), level, p.count(), p.regularLayoutCount(), 100 * p.shareOfRegular(),
                        p.complete() ? "yes" : "no", p.left(), p.beyondReach(), p.rounds(), p.candidates(),
                        p.elapsedMillis() / 1000.0);
            }
        }
    }
}
