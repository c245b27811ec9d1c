package org.lpzplanner.report;

import java.util.List;

/**
 * A part of the report built from the facts of one revision: usually one or more {@link Schedule}s,
 * possibly with headings and paragraphs. Parts print in the order of {@link ReportParts#SCHEDULES}.
 * Implementations are stateless.
 */
@FunctionalInterface
public interface ReportPart {

    /** The blocks of this part; empty when the revision has nothing for it. */
    List<ReportBlock> blocks(ReportFacts facts);
}
