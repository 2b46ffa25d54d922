package org.twinorbit.harness.baseline;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.twinorbit.harness.report.ResultJson;
import org.twinorbit.harness.report.ToolInfo;

/**
 * The JSON of a check:
 *
 * <pre>
 * tool:         the build that checked
 * baseline:     file, kind, tool (the build that wrote it)
 * result:       pass | fail
 * two_sided:    true when any change beyond the tolerance fails
 * counts:       rows, failed_rows, regressions, missing, improvements, new
 * differences:  [{case, row, kind (regression | improvement | new | missing), what, baseline,
 *               new (values as text with every digit; labels as words), tolerance {relative,
 *               absolute} or null}]
 * </pre>
 */
public final class CheckJson {

    private CheckJson() {}

    public static String of(CheckReport c) {
        CheckResult r = c.result();
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("tool", ToolInfo.json());
        Map<String, Object> b = new LinkedHashMap<>();
        b.put("file", c.baselineFile());
        b.put("kind", c.baseline().kind().label());
        b.put("tool", c.baseline().tool());
        m.put("baseline", b);
        m.put("result", r.passed() ? "pass" : "fail");
        m.put("two_sided", c.tolerances().twoSided());
        Map<String, Object> counts = new LinkedHashMap<>();
        counts.put("rows", r.rows().size());
        counts.put("failed_rows", r.failedRows());
        counts.put("regressions", r.count(Difference.Kind.REGRESSION));
        counts.put("missing", r.count(Difference.Kind.MISSING));
        counts.put("improvements", r.count(Difference.Kind.IMPROVEMENT));
        counts.put("new", r.count(Difference.Kind.NEW));
        m.put("counts", counts);
        List<Object> diffs = new ArrayList<>();
        for (Difference d : r.differences()) {
            Map<String, Object> o = new LinkedHashMap<>();
            o.put("case", d.caseName());
            o.put("row", d.row());
            o.put("kind", d.kind().label());
            o.put("what", d.what());
            o.put("baseline", d.baseline());
            o.put("new", d.current());
            if (d.tolerance() == null) {
                o.put("tolerance", null);
            } else {
                Map<String, Object> t = new LinkedHashMap<>();
                t.put("relative", d.tolerance().relative());
                t.put("absolute", d.tolerance().absolute());
                o.put("tolerance", t);
            }
            diffs.add(o);
        }
        m.put("differences", diffs);
        return ResultJson.write(m);
    }
}
