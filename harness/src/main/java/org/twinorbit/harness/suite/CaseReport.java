package org.twinorbit.harness.suite;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.twinorbit.harness.Format;
import org.twinorbit.harness.report.ResultJson;
import org.twinorbit.harness.report.ResultTables;
import org.twinorbit.harness.run.CaseResult;
import org.twinorbit.harness.run.ResultRow;
import org.twinorbit.harness.verdict.Check;
import org.twinorbit.harness.verdict.Finding;
import org.twinorbit.harness.verdict.RowVerdict;
import org.twinorbit.harness.verdict.VerdictReport;

/**
 * One case's share of the suite's tables, made from its {@link CaseResult} once: its element of
 * validation.json, its validation.csv lines, its overview line, its validation.md section and its
 * verdicts. {@link ValidationReport} writes the files from these alone, so that a suite cut into
 * shards ({@code suite --shard I/K}) can save them per case ({@link #toMap}, exact: text as
 * written, numbers in Java's shortest round-trip form) and {@code merge} writes the same bytes.
 *
 * @param name     the case's name
 * @param field    the case's field, which groups the sections of validation.md
 * @param document the case's element of validation.json's {@code cases}
 * @param csvRows  its lines of validation.csv, each ending in a newline
 * @param overview its cells of the overview table, in {@link ValidationReport#OVERVIEW_HEADER} order
 * @param section  its section of validation.md without the plot links: heading, description, table
 * @param verdicts its integrator rows' verdicts, the suite's expectations applied
 */
public record CaseReport(String name, String field, JsonNode document, String csvRows, List<String> overview,
                         String section, List<RowVerdict> verdicts) {

    private static final ObjectMapper MAPPER = new ObjectMapper();

    public CaseReport {
        overview = List.copyOf(overview);
        verdicts = List.copyOf(verdicts);
    }

    /** The case's share of the tables, {@code quick} choosing the suite's expectations. */
    public static CaseReport of(CaseResult r, boolean quick) {
        List<RowVerdict> verdicts = ValidationSuite.verdicts(List.of(r), quick);
        JsonNode doc = MAPPER.valueToTree(ResultJson.caseDocument(r, verdicts));
        StringBuilder section = new StringBuilder();
        section.append("### ").append(r.resolved().spec().name()).append("\n\n");
        for (String line : ResultTables.describe(r)) {
            section.append("- ").append(line).append('\n');
        }
        section.append('\n').append(ResultTables.table(r, null).markdown()).append('\n');
        return new CaseReport(r.resolved().spec().name(), r.resolved().spec().field(), doc, ResultTables.csvRows(r),
                overviewCells(r, verdicts), section.toString(), verdicts);
    }

    private static List<String> overviewCells(CaseResult r, List<RowVerdict> verdicts) {
        ResultRow boris = find(r, "boris", "discretisation");
        ResultRow rk4 = find(r, "rk4", "discretisation");
        ResultRow gc = find(r, "gc-rk4", "discretisation");
        ResultRow model = find(r, "gc-reference", "model");
        List<String> bad = new ArrayList<>();
        for (RowVerdict v : verdicts) {
            String cell = VerdictReport.cell(v);
            if (!cell.isEmpty()) {
                bad.add(v.integrator() + ": " + cell);
            }
        }
        return List.of(r.resolved().spec().name(), r.resolved().species().name(), Format.number(r.resolved().eps()),
                Format.number(r.resolved().spec().pitchDeg()), model == null ? "—" : model.orbitClass(),
                worst(boris, "energy_error"), worst(boris, "phase_error"),
                boris == null || Double.isNaN(boris.order()) ? "—"
                        : String.format(java.util.Locale.ROOT, "%.2f", boris.order()),
                worst(rk4, "energy_error"), worst(gc, "position_error_rho"), worst(model, "mu_change"),
                worst(model, "mu_jump"), worst(model, "drift_error"), worst(model, "position_error_rho"),
                worst(model, "bounce_period_error"), bad.isEmpty() ? "" : String.join("; ", bad));
    }

    private static ResultRow find(CaseResult r, String name, String kind) {
        return r.rows().stream().filter(x -> x.integrator().equals(name) && x.errorKind().equals(kind))
                .findFirst().orElse(null);
    }

    private static String worst(ResultRow row, String metric) {
        return row == null ? "—" : Format.number(row.metric(metric).worst());
    }

    /** The report as a JSON object, every part exact. */
    public Map<String, Object> toMap() {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("name", name);
        m.put("field", field);
        m.put("document", document);
        m.put("csv", csvRows);
        m.put("overview", overview);
        m.put("section", section);
        List<Object> vs = new ArrayList<>();
        for (RowVerdict v : verdicts) {
            Map<String, Object> o = new LinkedHashMap<>();
            o.put("case", v.caseName());
            o.put("integrator", v.integrator());
            List<Object> fs = new ArrayList<>();
            for (Finding f : v.findings()) {
                Map<String, Object> x = new LinkedHashMap<>();
                x.put("check", f.check().name());
                x.put("failure", f.failure());
                x.put("detail", f.detail());
                x.put("expected", f.expected());
                fs.add(x);
            }
            o.put("findings", fs);
            vs.add(o);
        }
        m.put("verdicts", vs);
        return m;
    }

    /**
     * Reads {@link #toMap}'s object.
     *
     * @throws IllegalArgumentException saying what is missing or mistyped
     */
    public static CaseReport fromTree(JsonNode root) {
        if (root == null || !root.isObject()) {
            throw new IllegalArgumentException("not a JSON object");
        }
        List<String> overview = new ArrayList<>();
        for (JsonNode c : need(root, "overview", JsonNode::isArray)) {
            overview.add(text(c, "overview"));
        }
        if (overview.size() != ValidationReport.OVERVIEW_HEADER.size()) {
            throw new IllegalArgumentException("'overview' has " + overview.size() + " cells, not "
                    + ValidationReport.OVERVIEW_HEADER.size());
        }
        List<RowVerdict> verdicts = new ArrayList<>();
        for (JsonNode v : need(root, "verdicts", JsonNode::isArray)) {
            List<Finding> findings = new ArrayList<>();
            for (JsonNode f : need(v, "findings", JsonNode::isArray)) {
                Check check;
                try {
                    check = Check.valueOf(need(f, "check", JsonNode::isTextual).asText());
                } catch (IllegalArgumentException e) {
                    throw new IllegalArgumentException("unknown check " + f.get("check"));
                }
                findings.add(new Finding(check, need(f, "failure", JsonNode::isBoolean).asBoolean(),
                        need(f, "detail", JsonNode::isTextual).asText(), need(f, "expected", JsonNode::isBoolean).asBoolean()));
            }
            verdicts.add(new RowVerdict(need(v, "case", JsonNode::isTextual).asText(),
                    need(v, "integrator", JsonNode::isTextual).asText(), findings));
        }
        return new CaseReport(need(root, "name", JsonNode::isTextual).asText(),
                need(root, "field", JsonNode::isTextual).asText(), need(root, "document", JsonNode::isObject),
                need(root, "csv", JsonNode::isTextual).asText(), overview,
                need(root, "section", JsonNode::isTextual).asText(), verdicts);
    }

    private static String text(JsonNode n, String key) {
        if (!n.isTextual()) {
            throw new IllegalArgumentException("'" + key + "' holds " + n.getNodeType() + ", not text");
        }
        return n.asText();
    }

    private static JsonNode need(JsonNode n, String key, java.util.function.Predicate<JsonNode> type) {
        JsonNode v = n.get(key);
        if (v == null || !type.test(v)) {
            throw new IllegalArgumentException("'" + key + "' is " + (v == null ? "missing" : v.getNodeType().toString()
                    .toLowerCase(java.util.Locale.ROOT)) + ", not what a case report holds there");
        }
        return v;
    }
}
