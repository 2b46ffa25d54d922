package org.twinorbit.harness.report;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Properties;

/**
 * Which build of twinorbit wrote a file: the {@code tool} object at the top of every JSON
 * document, {@code {"name": "twinorbit", "version": ..., "git_commit": ...}}.
 *
 * <p>The build writes {@value #RESOURCE} (harness/pom.xml, maven-antrun-plugin): {@code version}
 * is the Maven project version; {@code git_commit} is the last commit that changed anything
 * outside {@code results/}, with {@code -dirty} appended when tracked files outside
 * {@code results/} differ from it. Leaving {@code results/} out keeps the committed reports a
 * fixed point: committing regenerated results does not change the commit they name. Built
 * outside a git checkout, or run from classes the build did not make, both read
 * {@value #UNKNOWN}.
 */
public final class ToolInfo {

    public static final String NAME = "twinorbit";
    static final String RESOURCE = "/org/twinorbit/harness/report/build-info.properties";
    static final String UNKNOWN = "unknown";

    private static final Properties BUILD = load();

    private ToolInfo() {}

    public static String version() {
        return value("version");
    }

    public static String gitCommit() {
        return value("git_commit");
    }

    /** The {@code tool} object of a JSON document. */
    public static Map<String, Object> json() {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("name", NAME);
        m.put("version", version());
        m.put("git_commit", gitCommit());
        return m;
    }

    /** {@code document} with the {@code tool} object as its first member. */
    public static Map<String, Object> stamped(Map<String, Object> document) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("tool", json());
        m.putAll(document);
        return m;
    }

    private static String value(String key) {
        String v = BUILD.getProperty(key, "").trim();
        // an unfiltered placeholder means the file was copied, not written by the build
        return v.isEmpty() || v.contains("${") ? UNKNOWN : v;
    }

    private static Properties load() {
        Properties p = new Properties();
        try (InputStream in = ToolInfo.class.getResourceAsStream(RESOURCE)) {
            if (in != null) {
                p.load(in);
            }
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read " + RESOURCE, e);
        }
        return p;
    }
}
