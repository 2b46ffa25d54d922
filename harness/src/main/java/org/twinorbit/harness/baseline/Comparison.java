package org.twinorbit.harness.baseline;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * Compares the rows of a new run with a baseline's: each value against its tolerance, each
 * label for equality (status and verdict also by severity), rows and values present in one only.
 */
public final class Comparison {

    /** Verdict labels by severity: a higher one is worse. */
    private static final List<String> VERDICT_ORDER = List.of("pass", "expected-fail", "fail");

    private Comparison() {}

    /**
     * @return every difference, in the baseline's row order, new rows last
     */
    public static CheckResult compare(List<MeasuredRow> baseline, List<MeasuredRow> current, Tolerances tol) {
        Map<String, MeasuredRow> now = new LinkedHashMap<>();
        current.forEach(r -> now.put(r.id(), r));
        Set<String> seen = new LinkedHashSet<>();
        List<Difference> out = new ArrayList<>();
        List<MeasuredRow> rows = new ArrayList<>();
        for (MeasuredRow b : baseline) {
            seen.add(b.id());
            rows.add(b);
            MeasuredRow n = now.get(b.id());
            if (n == null) {
                out.add(new Difference(b.caseName(), b.row(), Difference.Kind.MISSING, "row", "", "", null));
                continue;
            }
            labels(b, n, tol, out);
            values(b, n, tol, out);
        }
        for (MeasuredRow n : current) {
            if (!seen.contains(n.id())) {
                rows.add(n);
                out.add(new Difference(n.caseName(), n.row(), Difference.Kind.NEW, "row", "", "", null));
            }
        }
        return new CheckResult(rows, out);
    }

    private static void labels(MeasuredRow b, MeasuredRow n, Tolerances tol, List<Difference> out) {
        for (Map.Entry<String, String> e : b.labels().entrySet()) {
            String key = e.getKey();
            String was = e.getValue();
            String is = n.labels().get(key);
            if (is == null) {
                out.add(diff(b, Difference.Kind.MISSING, key, was, "", null));
            } else if (!is.equals(was)) {
                out.add(diff(b, labelChange(key, was, is, tol.twoSided()), key, was, is, null));
            }
        }
        n.labels().forEach((k, v) -> {
            if (!b.labels().containsKey(k)) {
                out.add(diff(b, Difference.Kind.NEW, k, "", v, null));
            }
        });
    }

    /** A status back to ok or a verdict that got less severe is an improvement; any other change a regression. */
    private static Difference.Kind labelChange(String key, String was, String is, boolean twoSided) {
        boolean better = switch (key) {
            case "status" -> is.equals("ok");
            case "verdict" -> VERDICT_ORDER.indexOf(is) >= 0 && VERDICT_ORDER.indexOf(is) < VERDICT_ORDER.indexOf(was);
            default -> false; // orbit class, mu_jump_from, threshold outcome: no better side
        };
        return better && !twoSided ? Difference.Kind.IMPROVEMENT : Difference.Kind.REGRESSION;
    }

    private static void values(MeasuredRow b, MeasuredRow n, Tolerances tol, List<Difference> out) {
        for (Map.Entry<String, Double> e : b.values().entrySet()) {
            Metric m = Metric.of(e.getKey());
            if (!tol.compared(m)) {
                continue;
            }
            double was = e.getValue();
            Double is = n.values().get(e.getKey());
            Tolerance t = tol.of(b.caseName(), m);
            if (is == null || (Double.isNaN(is) && !Double.isNaN(was))) {
                out.add(diff(b, Difference.Kind.MISSING, e.getKey(), text(was), is == null ? "" : text(is), t));
                continue;
            }
            if (Double.isNaN(was)) {
                if (!Double.isNaN(is)) {
                    out.add(diff(b, Difference.Kind.NEW, e.getKey(), text(was), text(is), t));
                }
                continue;
            }
            Difference.Kind k = change(was, is, t, m.direction(), tol.twoSided());
            if (k != null) {
                out.add(diff(b, k, e.getKey(), text(was), text(is), t));
            }
        }
        n.values().forEach((k, v) -> {
            if (!b.values().containsKey(k) && tol.compared(Metric.of(k)) && !Double.isNaN(v)) {
                out.add(diff(b, Difference.Kind.NEW, k, "", text(v), null));
            }
        });
    }

    /** Null when within tolerance. Both values are numbers or infinities. */
    static Difference.Kind change(double was, double is, Tolerance t, Direction d, boolean twoSided) {
        if (was == is) {
            return null;
        }
        if (!Double.isInfinite(was) && !Double.isInfinite(is) && Math.abs(is - was) <= t.allowed(was)) {
            return null;
        }
        boolean better = switch (d) {
            case SMALLER_IS_BETTER -> Math.abs(is) < Math.abs(was);
            case LARGER_IS_BETTER -> is > was;
            case NONE -> false;
        };
        return better && !twoSided ? Difference.Kind.IMPROVEMENT : Difference.Kind.REGRESSION;
    }

    private static Difference diff(MeasuredRow r, Difference.Kind k, String what, String was, String is, Tolerance t) {
        return new Difference(r.caseName(), r.row(), k, what, was, is, t);
    }

    /** Every digit: a difference of 1e-9 relative must be visible in the report. */
    static String text(double v) {
        if (Double.isNaN(v)) {
            return "null";
        }
        if (Double.isInfinite(v)) {
            return v > 0 ? "inf" : "-inf";
        }
        return Double.toString(v);
    }
}
