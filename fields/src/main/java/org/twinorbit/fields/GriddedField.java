package org.twinorbit.fields;

/**
 * A static magnetic field known on the nodes of a grid and interpolated in between
 * ({@link GridFile} reads and writes them). Besides the {@link Field} facts it tells its grid and
 * how far its interpolant is from divergence-free.
 */
public interface GriddedField extends Field {

    /** The grid's coordinate system. */
    GridGeometry geometry();

    /** One line: geometry, nodes per axis, spacing with units, interpolation. */
    String gridSummary();

    /**
     * The Cartesian points (m) at the centres of the grid's cells, where {@link #maxDivergence}
     * looks: the interpolant is exact at the nodes, so its error is largest between them.
     */
    double[][] cellCentres();

    /**
     * max |∇·B| L/|B| (dimensionless) of the interpolant over the cell centres, with L the field's
     * length (the grid's largest extent when L is infinite); computed on first call.
     */
    double maxDivergence();

    /** The text of {@link #maxDivergence}, for reports. */
    default String divergenceSummary() {
        return String.format(java.util.Locale.ROOT, "max |div B| L/|B| of the interpolant over the cell centres = %.2e",
                maxDivergence());
    }

    /** Computes {@link #maxDivergence} for a field (a helper for implementations). */
    static double divergenceOver(GriddedField f, double extent) {
        double l = Double.isFinite(f.length()) ? f.length() : extent;
        org.twinorbit.shared.FieldSample s = new org.twinorbit.shared.FieldSample();
        double worst = 0;
        for (double[] p : f.cellCentres()) {
            f.evaluate(0, p[0], p[1], p[2], s);
            double b = s.bMag();
            if (b > 0) {
                worst = Math.max(worst, Math.abs(s.divB()) * l / b);
            }
        }
        return worst;
    }
}
