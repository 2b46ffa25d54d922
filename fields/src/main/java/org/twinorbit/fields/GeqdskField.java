package org.twinorbit.fields;

import java.util.List;
import org.apache.commons.math3.analysis.interpolation.SplineInterpolator;
import org.apache.commons.math3.analysis.polynomials.PolynomialSplineFunction;
import org.twinorbit.shared.FieldSample;
import org.twinorbit.shared.Vec3;

/**
 * The field of a G-EQDSK equilibrium ({@link GeqdskFile}): B = ∇ψ × ∇φ + F(ψ) ∇φ
 * ({@link AxisymmetricEquilibrium}), ψ from the C² bicubic spline of psirz ({@link BicubicSpline};
 * B and its Jacobian are the spline's own first and second derivatives) and F from the cubic
 * spline of fpol in ψ (Commons Math, natural ends), constant beyond the last closed surface
 * (vacuum). The file's signs are turned into twinorbit's by its COCOS ({@link Cocos}). The
 * limiter polygon is the wall: the domain is inside it and inside the grid, a particle crossing
 * either is lost. L = rcentr, the file's reference major radius (the R0 of ε = ρ/R0, as for the
 * analytic tokamaks).
 */
public final class GeqdskField implements AxisymmetricEquilibrium {

    private final String name;
    private final GeqdskData data;
    private final Cocos cocos;
    private final BicubicSpline psi;
    private final PolynomialSplineFunction fOfLevel;
    private final PolynomialSplineFunction fPrimeOfLevel;
    private final PolynomialSplineFunction pOfLevel;
    private final PolynomialSplineFunction pPrimeOfLevel;
    private final double psiAxis;
    private final double psiBoundary;
    private final double[] axis;
    private final WallPolygon wall;
    private final double rMin, rMax, zMin, zMax;
    private final List<Invariant> invariants;

    /**
     * @param where the file, for messages
     * @throws FieldParameterException for data that do not make an equilibrium, naming the line
     */
    GeqdskField(String name, GeqdskData d, Cocos cocos, String where) {
        this.name = name;
        this.data = d;
        this.cocos = cocos;
        double k = cocos.psiFactor();
        double[][] grid = new double[d.nw()][d.nh()];
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < d.nw(); i++) {
            for (int j = 0; j < d.nh(); j++) {
                grid[i][j] = k * d.psirz()[j][i];
                lo = Math.min(lo, grid[i][j]);
                hi = Math.max(hi, grid[i][j]);
            }
        }
        String psiLine = "line " + d.line(GeqdskData.Block.PSIRZ);
        if (!(hi > lo)) {
            throw new FieldParameterException(where + ": " + psiLine + ": psirz: every value is " + lo + ": the flux is flat");
        }
        this.rMin = d.rleft();
        this.rMax = d.rleft() + d.rdim();
        this.zMin = d.zmid() - d.zdim() / 2;
        this.zMax = d.zmid() + d.zdim() / 2;
        this.psi = new BicubicSpline(rMin, d.rdim() / (d.nw() - 1), zMin, d.zdim() / (d.nh() - 1), grid);
        this.psiAxis = k * d.simag();
        this.psiBoundary = k * d.sibry();
        if (d.current() != 0 && Math.signum(d.sibry() - d.simag()) != cocos.sigmaBp() * Math.signum(d.current())) {
            throw new FieldParameterException(where + ": line " + d.line(GeqdskData.Block.SCALARS)
                    + ": simag, sibry, current: psi " + (d.sibry() > d.simag() ? "rises" : "falls")
                    + " outward with current " + d.current() + " A, which contradicts COCOS " + cocos.index()
                    + " (sign(sibry - simag) = sigma_Bp sign(current)); set the field parameter cocos to the file's "
                    + "convention (" + (cocos.sigmaBp() > 0 ? "3, 4, 7, 8, 13, 14, 17 or 18" : "1, 2, 5, 6, 11, 12, 15 or 16")
                    + " fit these signs)");
        }
        double[] levels = new double[d.nw()];
        for (int i = 0; i < d.nw(); i++) {
            levels[i] = (double) i / (d.nw() - 1);
        }
        double[] f = new double[d.nw()];
        for (int i = 0; i < d.nw(); i++) {
            f[i] = cocos.toroidalSign() * d.fpol()[i];
            if (f[i] == 0 || Math.signum(f[i]) != Math.signum(f[0])) {
                throw new FieldParameterException(where + ": line " + d.line(GeqdskData.Block.FPOL)
                        + ": fpol: value " + (i + 1) + " is " + d.fpol()[i] + ": F = R B_phi must keep one sign, never 0");
            }
        }
        this.fOfLevel = new SplineInterpolator().interpolate(levels, f);
        this.fPrimeOfLevel = fOfLevel.polynomialSplineDerivative();
        this.pOfLevel = new SplineInterpolator().interpolate(levels, d.pres());
        this.pPrimeOfLevel = pOfLevel.polynomialSplineDerivative();
        this.axis = new double[] {d.rmaxis(), d.zmaxis()};
        if (!inGrid(d.rmaxis(), d.zmaxis())) {
            throw new FieldParameterException(where + ": line " + d.line(GeqdskData.Block.SCALARS)
                    + ": rmaxis, zmaxis: the magnetic axis (" + d.rmaxis() + ", " + d.zmaxis() + ") m is off the grid");
        }
        for (int b = 0; b < d.rbbbs().length; b++) {
            if (!inGrid(d.rbbbs()[b], d.zbbbs()[b])) {
                throw new FieldParameterException(where + ": line " + d.line(GeqdskData.Block.BOUNDARY)
                        + ": rbbbs, zbbbs: boundary point " + (b + 1) + " (" + d.rbbbs()[b] + ", " + d.zbbbs()[b]
                        + ") m is off the grid R in [" + rMin + ", " + rMax + "], Z in [" + zMin + ", " + zMax + "]");
            }
        }
        if (d.rlim().length >= 3) {
            this.wall = new WallPolygon(d.rlim(), d.zlim());
        } else if (d.rlim().length == 0 && d.rbbbs().length >= 3) {
            this.wall = new WallPolygon(d.rbbbs(), d.zbbbs());
        } else {
            throw new FieldParameterException(where + ": line " + d.line(GeqdskData.Block.COUNTS)
                    + ": limitr: the wall needs a limiter of at least 3 points (or, with none, a boundary of at least 3); got "
                    + d.rlim().length + " limiter and " + d.rbbbs().length + " boundary points");
        }
        if (!(wall.signedDistance(d.rmaxis(), d.zmaxis()) > 0)) {
            throw new FieldParameterException(where + ": line " + d.line(GeqdskData.Block.LIMITER)
                    + ": rlim, zlim: the magnetic axis (" + d.rmaxis() + ", " + d.zmaxis() + ") m is not inside the limiter");
        }
        checkNested(where);
        this.invariants = List.of(
                Invariants.energy(this),
                AxisymmetricEquilibrium.toroidalMomentum(this));
    }

    private boolean inGrid(double r, double z) {
        double tol = 1e-9 * (rMax - rMin + zMax - zMin);
        return r >= rMin - tol && r <= rMax + tol && z >= zMin - tol && z <= zMax + tol;
    }

    /**
     * ψ_N rises monotonically from the axis to each boundary point, starting near 0 and ending
     * near 1: otherwise simag, sibry and psirz do not describe the same nested surfaces.
     */
    private void checkNested(String where) {
        String at = where + ": line " + data.line(GeqdskData.Block.PSIRZ) + ": psirz: ";
        double[] p = new double[6];
        double span = psiBoundary - psiAxis;
        psi.evaluate(axis[0], axis[1], p);
        double atAxis = (p[0] - psiAxis) / span;
        if (Math.abs(atAxis) > 0.05) {
            throw new FieldParameterException(at + "psi at the magnetic axis is " + round(atAxis)
                    + " of the way from simag to sibry (must be ~0): simag or the axis disagrees with psirz");
        }
        int nb = data.rbbbs().length;
        int stride = Math.max(1, nb / 64);
        for (int b = 0; b < nb; b += stride) {
            double br = data.rbbbs()[b];
            double bz = data.zbbbs()[b];
            double prev = atAxis;
            int n = 40;
            for (int s = 1; s <= n; s++) {
                double t = (double) s / n;
                psi.evaluate(axis[0] + t * (br - axis[0]), axis[1] + t * (bz - axis[1]), p);
                double level = (p[0] - psiAxis) / span;
                if (level < prev - 1e-3) {
                    throw new FieldParameterException(at + "psi is not monotonic from the magnetic axis to boundary point "
                            + (b + 1) + " (" + br + ", " + bz + ") m: psi_N falls from " + round(prev) + " to " + round(level));
                }
                prev = level;
            }
            if (Math.abs(prev - 1) > 0.05) {
                throw new FieldParameterException(at + "psi at boundary point " + (b + 1) + " (" + br + ", " + bz
                        + ") m is " + round(prev) + " of the way from simag to sibry (must be ~1): sibry or the boundary disagrees");
            }
        }
    }

    private static String round(double v) {
        return String.format(java.util.Locale.ROOT, "%.4g", v);
    }

    @Override public String name() { return name; }

    /** Per-thread scratch, so that an evaluation allocates nothing. */
    private final ThreadLocal<double[]> scratch = ThreadLocal.withInitial(() -> new double[6]);

    @Override
    public void evaluate(double t, double x, double y, double z, FieldSample out) {
        double[] p = scratch.get();
        psi.evaluate(Math.sqrt(x * x + y * y), z, p);
        AxisymmetricEquilibrium.fill(x, y, p[1], p[2], p[3], p[4], p[5], f(p[0]), fPrime(p[0]), out);
    }

    @Override
    public void psi(double r, double z, double[] out) {
        psi.evaluate(r, z, out);
    }

    private double level(double psiValue) {
        return (psiValue - psiAxis) / (psiBoundary - psiAxis);
    }

    /** F(ψ): the spline inside, its tangent below the axis value, constant beyond the boundary (vacuum). */
    @Override
    public double f(double psiValue) {
        double s = level(psiValue);
        if (s >= 1) {
            return fOfLevel.value(1);
        }
        if (s <= 0) {
            return fOfLevel.value(0) + s * fPrimeOfLevel.value(0);
        }
        return fOfLevel.value(s);
    }

    @Override
    public double fPrime(double psiValue) {
        double s = level(psiValue);
        if (s >= 1) {
            return 0;
        }
        return fPrimeOfLevel.value(Math.max(0, s)) / (psiBoundary - psiAxis);
    }

    @Override
    public double pressure(double psiValue) {
        double s = level(psiValue);
        return s >= 1 || s < 0 ? (s < 0 ? pOfLevel.value(0) : 0) : pOfLevel.value(s);
    }

    @Override
    public double pressurePrime(double psiValue) {
        double s = level(psiValue);
        return s >= 1 || s < 0 ? 0 : pPrimeOfLevel.value(s) / (psiBoundary - psiAxis);
    }

    @Override public double[] axis() { return axis.clone(); }
    @Override public double psiAxis() { return psiAxis; }
    @Override public double psiBoundary() { return psiBoundary; }
    /** The file's contents as read. */
    public GeqdskData data() { return data; }
    public Cocos cocos() { return cocos; }
    public WallPolygon wall() { return wall; }

    @Override public double length() { return data.rcentr(); }
    @Override public String lengthMeaning() { return "rcentr, the file's reference major radius"; }
    @Override public boolean hasElectricField() { return false; }

    @Override
    public double domainMargin(double x, double y, double z) {
        double r = Math.sqrt(x * x + y * y);
        double box = Math.min(Math.min(r - rMin, rMax - r), Math.min(z - zMin, zMax - z));
        return Math.min(box, wall.signedDistance(r, z));
    }

    @Override
    public String domainMeaning() {
        return "inside the limiter (the wall) and the grid; a particle crossing either is lost";
    }

    @Override
    public void vectorPotential(double t, double x, double y, double z, double[] out) {
        AxisymmetricEquilibrium.vectorPotential(this, x, y, z, out);
    }

    @Override public List<Invariant> invariants() { return invariants; }

    /** Halfway from the axis to the outermost boundary point (or limiter point) in R. */
    @Override
    public Vec3 defaultStart() {
        double outer = axis[0];
        double[] rs = data.rbbbs().length > 0 ? data.rbbbs() : data.rlim();
        for (double r : rs) {
            outer = Math.max(outer, r);
        }
        return new Vec3(0.5 * (axis[0] + outer), 0, axis[1]);
    }
}
