package org.twinorbit.harness.baseline;

import java.io.StringWriter;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import javax.xml.parsers.DocumentBuilderFactory;
import javax.xml.parsers.ParserConfigurationException;
import javax.xml.transform.OutputKeys;
import javax.xml.transform.TransformerException;
import javax.xml.transform.TransformerFactory;
import javax.xml.transform.dom.DOMSource;
import javax.xml.transform.stream.StreamResult;
import org.w3c.dom.Document;
import org.w3c.dom.Element;

/**
 * The JUnit XML of a check, in the common layout CI servers read: {@code <testsuites>}, one
 * {@code <testsuite>} per case, one {@code <testcase>} per case and row (classname the case,
 * name the row). A row that failed has one {@code <failure>} whose message names the first
 * failing metric with its baseline value, new value and tolerance (or, when no metric failed,
 * the first failing label or the missing row), and whose text lists every
 * difference of the row. Built with the JDK's DOM, so every character is escaped.
 */
public final class CheckJunit {

    private CheckJunit() {}

    public static String of(CheckReport c) {
        CheckResult r = c.result();
        Document doc;
        try {
            doc = DocumentBuilderFactory.newInstance().newDocumentBuilder().newDocument();
        } catch (ParserConfigurationException e) {
            throw new IllegalStateException(e);
        }
        Element root = doc.createElement("testsuites");
        root.setAttribute("name", "twinorbit check " + c.baselineFile());
        root.setAttribute("tests", Integer.toString(r.rows().size()));
        root.setAttribute("failures", Long.toString(r.failedRows()));
        root.setAttribute("errors", "0");
        doc.appendChild(root);
        Map<String, List<MeasuredRow>> byCase = new LinkedHashMap<>();
        for (MeasuredRow row : r.rows()) {
            byCase.computeIfAbsent(row.caseName(), k -> new java.util.ArrayList<>()).add(row);
        }
        for (Map.Entry<String, List<MeasuredRow>> e : byCase.entrySet()) {
            Element suite = doc.createElement("testsuite");
            suite.setAttribute("name", e.getKey());
            int failures = 0;
            for (MeasuredRow row : e.getValue()) {
                Element tc = doc.createElement("testcase");
                tc.setAttribute("classname", e.getKey());
                tc.setAttribute("name", row.row());
                List<Difference> failing = r.of(row).stream().filter(d -> d.kind().fails()).toList();
                if (!failing.isEmpty()) {
                    failures++;
                    Element f = doc.createElement("failure");
                    // a metric with its values and tolerance says most; labels and rows otherwise
                    Difference first = failing.stream().filter(d -> d.tolerance() != null).findFirst()
                            .orElse(failing.get(0));
                    f.setAttribute("message", first.kind().label() + ": " + first.describe()
                            + (failing.size() > 1 ? " (and " + (failing.size() - 1) + " more)" : ""));
                    f.setAttribute("type", first.kind().label());
                    StringBuilder text = new StringBuilder();
                    for (Difference d : r.of(row)) {
                        text.append(d.kind().label()).append(": ").append(d.describe()).append('\n');
                    }
                    f.setTextContent(text.toString());
                    tc.appendChild(f);
                }
                suite.appendChild(tc);
            }
            suite.setAttribute("tests", Integer.toString(e.getValue().size()));
            suite.setAttribute("failures", Integer.toString(failures));
            suite.setAttribute("errors", "0");
            suite.setAttribute("skipped", "0");
            root.appendChild(suite);
        }
        try {
            var t = TransformerFactory.newInstance().newTransformer();
            t.setOutputProperty(OutputKeys.INDENT, "yes");
            t.setOutputProperty(OutputKeys.ENCODING, "UTF-8");
            t.setOutputProperty("{http://xml.apache.org/xslt}indent-amount", "2");
            StringWriter w = new StringWriter();
            t.transform(new DOMSource(doc), new StreamResult(w));
            return w.toString().replace("\r\n", "\n") + "\n";
        } catch (TransformerException e) {
            throw new IllegalStateException(e);
        }
    }
}
