package org.lpzplanner.transfer;

import static org.lpzplanner.transfer.ArchiveFields.bad;

import java.util.ArrayList;
import java.util.List;
import org.lpzplanner.analysis.AnalysisService;
import org.lpzplanner.engine.io.SiteDocument;
import org.lpzplanner.engine.io.SiteFormatException;
import org.lpzplanner.sites.SiteFiles;

/**
 * Reads every site file a site export stores as an upload is read ({@link SiteFiles#read}: GeoJSON
 * or WKT, footprints, heights, extent): the site's current file, each earlier file and the file
 * each revision analysed. A file that does not read refuses the import, naming the member and the
 * file number or revision it belongs to.
 *
 * <p>A revision's file is the one stored with it, whose SHA-256 must be the checksum the revision
 * records. Revisions stored before their file was kept have none; they find it by that checksum
 * among the export's current and earlier files, as a printed report does, and refuse the import
 * when none has it.
 */
final class ArchiveSiteFiles {

    /** The site file a revision analysed, read. */
    record RevisionFile(String text, SiteDocument document) {
    }

    private ArchiveSiteFiles() {}

    /**
     * Reads the current and earlier files and each revision's file, in that order.
     *
     * @return each revision's file, in the archive's order of revisions
     * @throws SiteFormatException   when the current file is not a valid site (as for an upload)
     * @throws org.lpzplanner.system.InvalidInputException naming the member of any other file that
     *         is not a valid site, or of a revision whose file is missing or not the one it analysed
     */
    static List<RevisionFile> read(SiteArchive archive) {
        SiteFiles.read(archive.site().fileText(), archive.site().fileName());
        for (int i = 0; i < archive.earlierFiles().size(); i++) {
            SiteArchive.EarlierFile file = archive.earlierFiles().get(i);
            read(file.text(), file.fileName(), "earlierFiles[" + i + "].text", "(earlier file " + file.number()
                    + ", " + file.fileName() + ")");
        }
        List<RevisionFile> out = new ArrayList<>();
        for (int i = 0; i < archive.revisions().size(); i++) {
            out.add(revisionFile(archive, i));
        }
        return out;
    }

    private static RevisionFile revisionFile(SiteArchive archive, int index) {
        SiteArchive.Revision r = archive.revisions().get(index);
        String p = "revisions[" + index + "]";
        String which = "(revision " + r.revision() + ")";
        if (r.sourceText() == null) {
            // already read above as the current or an earlier file
            return storedFiles(archive).stream().filter(f -> AnalysisService.sha256(f.text()).equals(r.inputsSha256()))
                    .findFirst().map(f -> new RevisionFile(f.text(), SiteFiles.read(f.text(), f.name())))
                    .orElseThrow(() -> bad(p + ".sourceText", "is missing " + which + " and no site file in the"
                            + " export has the checksum the revision records, so its results cannot be computed"
                            + " here; leave the revision out of the file to import the rest"));
        }
        if (r.sourceName() == null) {
            throw bad(p + ".sourceName", "is missing " + which + ": the site file kept with the revision needs"
                    + " its name to be read");
        }
        if (r.siteName() == null) {
            throw bad(p + ".siteName", "is missing " + which + ": a revision that keeps its site file also keeps"
                    + " the site's name it was analysed under");
        }
        SiteDocument document = read(r.sourceText(), r.sourceName(), p + ".sourceText",
                "(the site file revision " + r.revision() + " analysed)");
        String sha256 = AnalysisService.sha256(r.sourceText());
        if (!sha256.equals(r.inputsSha256())) {
            throw bad(p + ".inputsSha256", "does not match the site file kept with revision " + r.revision()
                    + " (its SHA-256 is " + sha256 + "): the file was changed after it was analysed");
        }
        return new RevisionFile(r.sourceText(), document);
    }

    private static SiteDocument read(String text, String name, String member, String which) {
        try {
            return SiteFiles.read(text, name);
        } catch (SiteFormatException e) {
            throw bad(member, which + " is not a valid site: " + e.getMessage());
        }
    }

    /** The site's current file, then its earlier files. */
    private static List<StoredFile> storedFiles(SiteArchive archive) {
        List<StoredFile> files = new ArrayList<>();
        files.add(new StoredFile(archive.site().fileName(), archive.site().fileText()));
        archive.earlierFiles().forEach(f -> files.add(new StoredFile(f.fileName(), f.text())));
        return files;
    }

    private record StoredFile(String name, String text) {
    }
}
