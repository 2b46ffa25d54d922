package org.twinorbit.harness;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;
import org.twinorbit.fields.Field;
import org.twinorbit.fields.FieldParameterException;
import org.twinorbit.fields.Fields;
import org.twinorbit.harness.export.FieldProbe;
import org.twinorbit.harness.report.ResultJson;
import org.twinorbit.harness.report.ToolInfo;
import org.twinorbit.shared.FieldSample;
import org.twinorbit.shared.Species;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/**
 * {@code twinorbit probe}: a field of the library at given points — B, E, the Jacobian
 * ∂B_i/∂x_j, |B|, b, ∇|B| and the field-line curvature (b·∇)b — so that an outside
 * implementation of the same field can be compared with it point by point.
 */
@Command(name = "probe", mixinStandardHelpOptions = true, sortOptions = false,
        description = "Evaluate a field of the library at points: B, E, the Jacobian dB_i/dx_j, |B|, b, grad|B| and "
                + "the field-line curvature (b.grad)b, as CSV (SI units in the column names) or JSON.")
public final class ProbeCommand implements Callable<Integer> {

    @Option(names = "--field", paramLabel = "NAME", required = true, description = "Field of the library (see 'twinorbit fields').")
    String field;

    @Option(names = {"-P", "--field-param"}, paramLabel = "NAME=VALUE", description = "Override a field parameter, in its unit (repeatable).")
    List<String> fieldParameters = new ArrayList<>();

    @Option(names = "--species", paramLabel = "NAME", defaultValue = "proton",
            description = "Species, for fields whose time scale depends on it (ramp, wave; default ${DEFAULT-VALUE}).")
    String species;

    @Option(names = "--at", paramLabel = "X,Y,Z", split = ";", description = "A point (m), repeatable.")
    List<String> points = new ArrayList<>();

    @Option(names = "--points", paramLabel = "FILE", description = "A CSV of points: header x_m,y_m,z_m (optionally t_s), one point per line.")
    Path pointsFile;

    @Option(names = "--time", paramLabel = "T", defaultValue = "0", description = "Time (s) for points without one (default ${DEFAULT-VALUE}).")
    double time;

    @Option(names = "--json", description = "Print JSON instead of CSV.")
    boolean json;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        if (!Double.isFinite(time)) {
            throw new BadInputException("--time: give a finite time in s, got " + time);
        }
        Species particle;
        try {
            particle = Species.parse(species);
        } catch (IllegalArgumentException e) {
            throw new BadInputException("--species: " + e.getMessage());
        }
        if (!Fields.isFile(field)) {
            try {
                Fields.provider(field);
            } catch (FieldParameterException e) {
                throw new BadInputException("--field: " + e.getMessage());
            }
        }
        Field f;
        try {
            f = Fields.create(field, parameters(), particle);
        } catch (FieldParameterException e) {
            throw new BadInputException("--field-param: " + e.getMessage());
        }
        List<double[]> at = new ArrayList<>();
        for (String p : points) {
            at.add(point(p, "--at"));
        }
        if (pointsFile != null) {
            at.addAll(readPoints(pointsFile));
        }
        if (at.isEmpty()) {
            throw new BadInputException("--at or --points: give at least one point (m), e.g. --at 1.5,0,0");
        }
        PrintWriter out = spec.commandLine().getOut();
        List<Map<String, Object>> rows = new ArrayList<>();
        StringBuilder csv = new StringBuilder("x_m,y_m,z_m,t_s," + String.join(",", FieldProbe.COLUMNS) + "\n");
        FieldSample s = new FieldSample();
        for (double[] p : at) {
            double[] v = FieldProbe.values(f, p, s);
            Map<String, Object> row = new LinkedHashMap<>();
            row.put("x_m", p[0]);
            row.put("y_m", p[1]);
            row.put("z_m", p[2]);
            row.put("t_s", p[3]);
            csv.append(num(p[0])).append(',').append(num(p[1])).append(',').append(num(p[2])).append(',')
                    .append(num(p[3]));
            for (int i = 0; i < FieldProbe.COLUMNS.size(); i++) {
                boolean flag = i == FieldProbe.COLUMNS.size() - 1;
                // outside the domain nothing is evaluated: null in JSON, an empty cell in CSV
                row.put(FieldProbe.COLUMNS.get(i), flag ? (Object) (v[i] == 1) : Double.isFinite(v[i]) ? (Object) v[i] : null);
                csv.append(',').append(flag ? (v[i] == 1 ? "true" : "false") : num(v[i]));
            }
            csv.append('\n');
            rows.add(row);
        }
        if (json) {
            Map<String, Object> doc = new LinkedHashMap<>();
            doc.put("field", field);
            doc.put("field_parameters", parameters());
            doc.put("points", rows);
            out.print(ResultJson.write(ToolInfo.stamped(doc)));
        } else {
            out.print(csv);
        }
        out.flush();
        return 0;
    }

    private Map<String, Double> parameters() {
        return OptionPairs.numbers(fieldParameters, "--field-param");
    }

    private double[] point(String text, String where) {
        String[] parts = text.trim().split("\\s*,\\s*");
        if (parts.length != 3 && parts.length != 4) {
            throw new BadInputException(where + ": a point is x,y,z in m (optionally ,t in s), got '" + text + "'");
        }
        double[] p = {0, 0, 0, time};
        for (int i = 0; i < parts.length; i++) {
            try {
                p[i] = Double.parseDouble(parts[i]);
            } catch (NumberFormatException e) {
                throw new BadInputException(where + ": '" + parts[i] + "' in '" + text + "' is not a number");
            }
            if (!Double.isFinite(p[i])) {
                throw new BadInputException(where + ": coordinates must be finite, got '" + text + "'");
            }
        }
        return p;
    }

    private List<double[]> readPoints(Path file) {
        List<String> lines;
        try {
            lines = Files.readAllLines(file);
        } catch (IOException e) {
            throw new BadInputException("--points: cannot read " + file + " (" + e.getMessage() + ")");
        }
        if (lines.isEmpty() || !lines.get(0).trim().toLowerCase(Locale.ROOT).matches("x_m\\s*,\\s*y_m\\s*,\\s*z_m(\\s*,\\s*t_s)?")) {
            throw new BadInputException("--points: " + file + " must start with the header x_m,y_m,z_m or x_m,y_m,z_m,t_s");
        }
        List<double[]> out = new ArrayList<>();
        for (int i = 1; i < lines.size(); i++) {
            if (!lines.get(i).isBlank()) {
                out.add(point(lines.get(i), "--points: " + file + " line " + (i + 1)));
            }
        }
        return out;
    }

    private static String num(double v) {
        return Double.isFinite(v) ? Double.toString(v) : "";
    }
}
