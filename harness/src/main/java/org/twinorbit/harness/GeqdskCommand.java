package org.twinorbit.harness;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.twinorbit.fields.AxisymmetricEquilibrium;
import org.twinorbit.fields.Cocos;
import org.twinorbit.fields.Field;
import org.twinorbit.fields.FieldParameterException;
import org.twinorbit.fields.Fields;
import org.twinorbit.fields.FluxSurfaces;
import org.twinorbit.fields.GeqdskFile;
import org.twinorbit.shared.Species;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * {@code twinorbit geqdsk}: an axisymmetric equilibrium of the library written as a G-EQDSK file
 * ({@link GeqdskFile}), which {@code --field geqdsk:FILE} then reads back, interpolated.
 */
@Command(name = "geqdsk", mixinStandardHelpOptions = true, sortOptions = false,
        description = "Write an axisymmetric equilibrium of the library (solovev) as a G-EQDSK file, which any "
                + "command reads back as --field geqdsk:FILE (bicubic spline of psi). The grid covers the plasma "
                + "and the wall with a margin; the wall (limiter) lies --wall-gap outside the last closed surface.")
public final class GeqdskCommand implements Callable<Integer> {

    @Option(names = "--field", paramLabel = "NAME", defaultValue = "solovev",
            description = "Axisymmetric equilibrium of the library (default: ${DEFAULT-VALUE}).")
    String field;

    @Option(names = {"-P", "--field-param"}, paramLabel = "NAME=VALUE", description = "Override a field parameter, "
            + "in its unit (repeatable, each name once).")
    List<String> fieldParameters = new java.util.ArrayList<>();

    @Option(names = "--nodes", paramLabel = "NR,NZ", split = ",", defaultValue = "129,129",
            description = "Grid nodes in R and in Z, each in [4, 4097] (default: ${DEFAULT-VALUE}).")
    List<Integer> nodes;

    @Option(names = "--wall-gap", paramLabel = "M", defaultValue = "0.05",
            description = "Distance of the wall outside the last closed surface, along rays from the axis (m, >= 0; "
                    + "default: ${DEFAULT-VALUE}).")
    double wallGap;

    @Option(names = "--cocos", paramLabel = "N", defaultValue = "" + Cocos.DEFAULT,
            description = "Sign convention of the file (COCOS, Sauter & Medvedev 2013: 1-8 or 11-18; "
                    + "default: ${DEFAULT-VALUE}).")
    int cocos;

    @Option(names = "--out", paramLabel = "FILE", required = true, description = "The G-EQDSK file to write.")
    Path out;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        if (nodes.size() != 2 || nodes.stream().anyMatch(n -> n < 4 || n > 4097)) {
            throw new BadInputException("--nodes: give NR,NZ, each in [4, 4097], got " + nodes);
        }
        if (!(wallGap >= 0) || !Double.isFinite(wallGap)) {
            throw new BadInputException("--wall-gap: must be a distance >= 0 m, got " + wallGap);
        }
        Cocos convention;
        Field f;
        try {
            convention = Cocos.of(cocos);
        } catch (FieldParameterException e) {
            throw new BadInputException("--cocos: " + e.getMessage());
        }
        try {
            f = Fields.create(field, OptionPairs.numbers(fieldParameters, "--field-param"), Species.DEUTERON);
        } catch (FieldParameterException e) {
            throw new BadInputException("field: " + e.getMessage());
        }
        if (!(f instanceof AxisymmetricEquilibrium eq)) {
            throw new BadInputException("--field: a G-EQDSK file holds an axisymmetric equilibrium (solovev or a "
                    + "geqdsk: file); '" + field + "' is not one");
        }
        double[] axis = eq.axis();
        FluxSurfaces s = new FluxSurfaces(eq, 0.01 * eq.length());
        double rLo = Double.POSITIVE_INFINITY, rHi = Double.NEGATIVE_INFINITY;
        double zLo = Double.POSITIVE_INFINITY, zHi = Double.NEGATIVE_INFINITY;
        for (int k = 0; k < 256; k++) {
            double[] p = s.point(2 * Math.PI * k / 256, 1.0);
            rLo = Math.min(rLo, p[0]);
            rHi = Math.max(rHi, p[0]);
            zLo = Math.min(zLo, p[1]);
            zHi = Math.max(zHi, p[1]);
        }
        // room for the wall and a quarter of the half-width beyond it, so that the spline's edge cells stay outside
        double margin = wallGap + 0.25 * (rHi - rLo) / 2;
        if (!(rLo - margin > 0)) {
            throw new BadInputException("--wall-gap: the grid would reach R <= 0; use a smaller gap than " + wallGap + " m");
        }
        String description = String.format(Locale.ROOT, "twinorbit %s cocos %d", field, convention.index());
        GeqdskFile.write(eq, description, rLo - margin, rHi + margin, zLo - margin, zHi + margin, nodes.get(0),
                nodes.get(1), wallGap, eq.length(), convention, out);
        PrintWriter pw = spec.commandLine().getOut();
        pw.println("wrote " + out + ": " + field + " on " + nodes.get(0) + " x " + nodes.get(1) + " nodes (R "
                + Format.number(rLo - margin) + "-" + Format.number(rHi + margin) + " m, Z " + Format.number(zLo - margin)
                + "-" + Format.number(zHi + margin) + " m), magnetic axis at R = " + Format.number(axis[0])
                + " m, COCOS " + convention.index() + "; use it as --field geqdsk:" + out);
        pw.flush();
        return 0;
    }
}
