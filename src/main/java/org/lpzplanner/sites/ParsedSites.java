package org.lpzplanner.sites;

import java.util.LinkedHashMap;
import java.util.Map;
import org.lpzplanner.engine.io.SiteDocument;
import org.springframework.beans.factory.annotation.Value;
import org.springframework.stereotype.Component;
import org.springframework.transaction.support.TransactionSynchronization;
import org.springframework.transaction.support.TransactionSynchronizationManager;

/**
 * The stored site files last read into the engine's model, kept by site id and version so that a
 * page view, an edit and the analysis after it read a file once instead of once each.
 *
 * <p>Why a version is a safe key: every change of a stored site raises its version
 * ({@link SiteRepository}), and a version is never given twice to one site, so an entry can only
 * be asked for with the text it was read from. An entry also keeps that text and is served only for
 * the same text, which keeps a version that was written in a transaction later rolled back (and so
 * written again with other text) from ever being served. Entries for the version a committed change
 * wrote are added after the commit ({@link #keepAfterCommit}), never before. The least recently used
 * entries go first beyond {@code lpz.sites.parsed-kept} (default 32; 0 keeps none); a site is small
 * in memory next to its analysis.
 *
 * <p>Thread safety: safe for concurrent use. The documents are shared: callers read them and never
 * change their geometries.
 */
@Component
public class ParsedSites {

    private record Key(long siteId, long version) {
    }

    private record Entry(String text, SiteDocument document) {
    }

    private final int capacity;
    private final LinkedHashMap<Key, Entry> entries;

    public ParsedSites(@Value("${lpz.sites.parsed-kept:32}") int capacity) {
        this.capacity = Math.max(0, capacity);
        this.entries = new LinkedHashMap<>(16, 0.75f, true) {
            @Override
            protected boolean removeEldestEntry(Map.Entry<Key, Entry> eldest) {
                return size() > ParsedSites.this.capacity;
            }
        };
    }

    /**
     * The site's file read into the engine's model, from the cache when this version was read before.
     *
     * @throws org.lpzplanner.engine.io.SiteFormatException when the stored text is not a valid site
     *         (only for files stored before a reader change; every file is checked when stored)
     */
    public SiteDocument document(StoredSite site) {
        Key key = new Key(site.id(), site.version());
        synchronized (this) {
            Entry entry = entries.get(key);
            if (entry != null && entry.text().equals(site.sourceText())) {
                return entry.document();
            }
        }
        SiteDocument document = SiteFiles.read(site.sourceText(), site.sourceName());
        keep(site.id(), site.version(), site.sourceText(), document);
        return document;
    }

    /**
     * Keeps a document read from {@code text} for this version of the site once the current
     * transaction commits (at once when there is none); nothing when it rolls back.
     */
    void keepAfterCommit(long siteId, long version, String text, SiteDocument document) {
        whenCommitted(() -> keep(siteId, version, text, document));
    }

    /**
     * After a change that kept the file (the analysis marking the site), the document read for
     * {@code from} serves {@code to} as well, once the current transaction commits.
     */
    void carryAfterCommit(long siteId, long from, long to, String text) {
        whenCommitted(() -> {
            Entry entry;
            synchronized (this) {
                entry = entries.get(new Key(siteId, from));
            }
            if (entry != null && entry.text().equals(text)) {
                keep(siteId, to, text, entry.document());
            }
        });
    }

    /** Drops every document of a site (it was deleted). */
    synchronized void forget(long siteId) {
        entries.keySet().removeIf(k -> k.siteId() == siteId);
    }

    synchronized int size() {
        return entries.size();
    }

    private synchronized void keep(long siteId, long version, String text, SiteDocument document) {
        if (capacity > 0) {
            entries.put(new Key(siteId, version), new Entry(text, document));
        }
    }

    private static void whenCommitted(Runnable action) {
        if (TransactionSynchronizationManager.isSynchronizationActive()) {
            TransactionSynchronizationManager.registerSynchronization(new TransactionSynchronization() {
                @Override
                public void afterCommit() {
                    action.run();
                }
            });
        } else {
            action.run();
        }
    }
}
