package org.twinorbit.fields;

import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.LUDecomposition;
import org.apache.commons.math3.linear.RealVector;

/**
 * The dimensionless up-down symmetric Solov'ev flux ψ̄(x, y), x = R/R0, y = Z/R0, of Cerfon &amp;
 * Freidberg (Phys. Plasmas 17, 032502, 2010, Sec. II–III): the particular solution
 * (1 − A) x⁴/8 + A x² ln x / 2 of Δ*ψ̄ = (1 − A) x² + A plus the seven even homogeneous
 * polynomials ψ1 ... ψ7, whose coefficients put the ψ̄ = 0 contour through the outer and inner
 * equatorial points x = 1 ± ε and the top point (1 − δε, κε), make the top point the highest
 * (ψ̄_x = 0 there), and give the contour the curvature of the shape x = 1 + ε cos(τ + α sin τ),
 * y = εκ sin τ (α = arcsin δ) at those three points.
 *
 * <p>Every function is kept as exact tables of coefficients of x^a y^b and x^a y^b ln x, so any
 * derivative up to third order is exact (no differencing).
 */
public final class SolovevFlux {

    /** Powers of x from −3 (after three derivatives of x² ln x) to 6. */
    private static final int X0 = 3;
    private static final int NX = 10;
    private static final int NY = 7;
    /** Highest derivative order kept. */
    public static final int MAX_ORDER = 3;

    private final double eps;
    private final double kappa;
    private final double delta;
    private final double a;
    /** c1 ... c7. */
    private final double[] coefficients;
    /** [dx][dy] -> {plain[NX][NY], log[NX][NY]} for ψ̄ with its coefficients. */
    private final double[][][][][] tables = new double[MAX_ORDER + 1][MAX_ORDER + 1][][][];
    /** The non-zero terms of ψ̄, ψ̄_x, ψ̄_y, ψ̄_xx, ψ̄_xy, ψ̄_yy: x-power index, y power, plain and log coefficient. */
    private final int[][] termX = new int[6][];
    private final int[][] termY = new int[6][];
    private final double[][] termPlain = new double[6][];
    private final double[][] termLog = new double[6][];
    private static final int[][] FIELD_ORDERS = {{0, 0}, {1, 0}, {0, 1}, {2, 0}, {1, 1}, {0, 2}};

    /**
     * @param eps   inverse aspect ratio a/R0, in (0, 1)
     * @param kappa elongation
     * @param delta triangularity, |δ| &lt; 1
     * @param a     the Solov'ev mix: A = 1 is all FF', A = 0 all pressure gradient
     */
    public SolovevFlux(double eps, double kappa, double delta, double a) {
        this.eps = eps;
        this.kappa = kappa;
        this.delta = delta;
        this.a = a;
        double[][][][] basis = new double[8][][][];
        basis[0] = particular(a);
        for (int i = 1; i <= 7; i++) {
            basis[i] = homogeneous(i);
        }
        coefficients = solve(basis);
        double[][][] sum = new double[2][NX][NY];
        add(sum, basis[0], 1.0);
        for (int i = 1; i <= 7; i++) {
            add(sum, basis[i], coefficients[i - 1]);
        }
        for (int dx = 0; dx <= MAX_ORDER; dx++) {
            for (int dy = 0; dx + dy <= MAX_ORDER; dy++) {
                double[][][] t = sum;
                for (int k = 0; k < dx; k++) {
                    t = dX(t);
                }
                for (int k = 0; k < dy; k++) {
                    t = dY(t);
                }
                tables[dx][dy] = t;
            }
        }
        for (int k = 0; k < 6; k++) {
            double[][][] t = tables[FIELD_ORDERS[k][0]][FIELD_ORDERS[k][1]];
            int n = 0;
            for (int i = 0; i < NX; i++) {
                for (int j = 0; j < NY; j++) {
                    n += t[0][i][j] != 0 || t[1][i][j] != 0 ? 1 : 0;
                }
            }
            termX[k] = new int[n];
            termY[k] = new int[n];
            termPlain[k] = new double[n];
            termLog[k] = new double[n];
            n = 0;
            for (int i = 0; i < NX; i++) {
                for (int j = 0; j < NY; j++) {
                    if (t[0][i][j] != 0 || t[1][i][j] != 0) {
                        termX[k][n] = i;
                        termY[k][n] = j;
                        termPlain[k][n] = t[0][i][j];
                        termLog[k][n] = t[1][i][j];
                        n++;
                    }
                }
            }
        }
    }

    /** Scratch for {@link #fieldDerivatives}: powers of x (index 0 is x^−3) and of y. */
    static final class Powers {
        final double[] x = new double[NX];
        final double[] y = new double[NY];
    }

    /**
     * ψ̄, ψ̄_x, ψ̄_y, ψ̄_xx, ψ̄_xy, ψ̄_yy at (x, y) into out[0..5], from the non-zero terms only;
     * allocates nothing.
     */
    void fieldDerivatives(double x, double y, Powers pw, double[] out) {
        double[] xp = pw.x;
        double[] yp = pw.y;
        double ix = 1 / x;
        xp[X0] = 1;
        for (int i = X0 - 1; i >= 0; i--) {
            xp[i] = xp[i + 1] * ix;
        }
        for (int i = X0 + 1; i < NX; i++) {
            xp[i] = xp[i - 1] * x;
        }
        yp[0] = 1;
        for (int j = 1; j < NY; j++) {
            yp[j] = yp[j - 1] * y;
        }
        double lx = Math.log(x);
        for (int k = 0; k < 6; k++) {
            int[] ti = termX[k];
            int[] tj = termY[k];
            double[] tp = termPlain[k];
            double[] tl = termLog[k];
            double sum = 0;
            for (int n = 0; n < ti.length; n++) {
                sum += (tp[n] + tl[n] * lx) * xp[ti[n]] * yp[tj[n]];
            }
            out[k] = sum;
        }
    }

    /** The particular solution (1 − A) x⁴/8 + A x² ln x / 2. */
    private static double[][][] particular(double a) {
        double[][][] t = new double[2][NX][NY];
        t[0][X0 + 4][0] = (1 - a) / 8;
        t[1][X0 + 2][0] = a / 2;
        return t;
    }

    /** ψ1 ... ψ7, the up-down symmetric homogeneous solutions up to degree 6 (Cerfon &amp; Freidberg 2010, Eq. 8). */
    private static double[][][] homogeneous(int i) {
        double[][][] t = new double[2][NX][NY];
        double[][] p = t[0];
        double[][] l = t[1];
        switch (i) {
            case 1 -> p[X0][0] = 1;
            case 2 -> p[X0 + 2][0] = 1;
            case 3 -> {
                p[X0][2] = 1;
                l[X0 + 2][0] = -1;
            }
            case 4 -> {
                p[X0 + 4][0] = 1;
                p[X0 + 2][2] = -4;
            }
            case 5 -> {
                p[X0][4] = 2;
                p[X0 + 2][2] = -9;
                l[X0 + 4][0] = 3;
                l[X0 + 2][2] = -12;
            }
            case 6 -> {
                p[X0 + 6][0] = 1;
                p[X0 + 4][2] = -12;
                p[X0 + 2][4] = 8;
            }
            case 7 -> {
                p[X0][6] = 8;
                p[X0 + 2][4] = -140;
                p[X0 + 4][2] = 75;
                l[X0 + 6][0] = -15;
                l[X0 + 4][2] = 180;
                l[X0 + 2][4] = -120;
            }
            default -> throw new IllegalArgumentException("no homogeneous solution " + i);
        }
        return t;
    }

    /** The seven shape conditions (Cerfon &amp; Freidberg 2010, Eq. 10–11), solved for c1 ... c7. */
    private double[] solve(double[][][][] basis) {
        double alpha = Math.asin(delta);
        double n1 = -(1 + alpha) * (1 + alpha) / (eps * kappa * kappa);
        double n2 = (1 - alpha) * (1 - alpha) / (eps * kappa * kappa);
        double n3 = -kappa / (eps * Math.cos(alpha) * Math.cos(alpha));
        double xo = 1 + eps;
        double xi = 1 - eps;
        double xt = 1 - delta * eps;
        double yt = kappa * eps;
        double[][] m = new double[7][7];
        double[] rhs = new double[7];
        for (int col = 0; col <= 7; col++) {
            double[][][] f = basis[col];
            double[] row = {
                value(f, 0, 0, xo, 0),
                value(f, 0, 0, xi, 0),
                value(f, 0, 0, xt, yt),
                value(f, 1, 0, xt, yt),
                value(f, 0, 2, xo, 0) + n1 * value(f, 1, 0, xo, 0),
                value(f, 0, 2, xi, 0) + n2 * value(f, 1, 0, xi, 0),
                value(f, 2, 0, xt, yt) + n3 * value(f, 0, 1, xt, yt)};
            for (int r = 0; r < 7; r++) {
                if (col == 0) {
                    rhs[r] = -row[r];
                } else {
                    m[r][col - 1] = row[r];
                }
            }
        }
        RealVector c = new LUDecomposition(new Array2DRowRealMatrix(m, false)).getSolver()
                .solve(new ArrayRealVector(rhs, false));
        return c.toArray();
    }

    private static void add(double[][][] sum, double[][][] t, double w) {
        for (int k = 0; k < 2; k++) {
            for (int i = 0; i < NX; i++) {
                for (int j = 0; j < NY; j++) {
                    sum[k][i][j] += w * t[k][i][j];
                }
            }
        }
    }

    /** d/dx of Σ (p + l ln x) x^a y^b: a p x^(a−1) + l (a x^(a−1) ln x + x^(a−1)). */
    private static double[][][] dX(double[][][] t) {
        double[][][] d = new double[2][NX][NY];
        for (int i = 1; i < NX; i++) {
            int pow = i - X0;
            for (int j = 0; j < NY; j++) {
                d[0][i - 1][j] += pow * t[0][i][j] + t[1][i][j];
                d[1][i - 1][j] += pow * t[1][i][j];
            }
        }
        for (int j = 0; j < NY; j++) {
            if (t[0][0][j] != 0 || t[1][0][j] != 0) {
                throw new IllegalStateException("derivative beyond the kept powers of x");
            }
        }
        return d;
    }

    private static double[][][] dY(double[][][] t) {
        double[][][] d = new double[2][NX][NY];
        for (int i = 0; i < NX; i++) {
            for (int j = 1; j < NY; j++) {
                d[0][i][j - 1] = j * t[0][i][j];
                d[1][i][j - 1] = j * t[1][i][j];
            }
        }
        return d;
    }

    private static double value(double[][][] dxdy0, int dx, int dy, double x, double y) {
        double[][][] t = dxdy0;
        for (int k = 0; k < dx; k++) {
            t = dX(t);
        }
        for (int k = 0; k < dy; k++) {
            t = dY(t);
        }
        return evaluate(t, x, y);
    }

    /** Σ (p + l ln x) x^a y^b by Horner's rule in y and in x (x^−3 factored out); allocates nothing. */
    private static double evaluate(double[][][] t, double x, double y) {
        double lx = Math.log(x);
        double[][] p = t[0];
        double[][] l = t[1];
        double sy = 0;
        for (int j = NY - 1; j >= 0; j--) {
            double sx = 0;
            for (int i = NX - 1; i >= 0; i--) {
                sx = sx * x + (p[i][j] + l[i][j] * lx);
            }
            sy = sy * y + sx;
        }
        return sy / (x * x * x);
    }

    /**
     * ∂^(dx+dy) ψ̄ / ∂x^dx ∂y^dy at (x, y), exact, dx + dy ≤ 3.
     *
     * @param x R/R0, &gt; 0
     * @param y Z/R0
     */
    public double derivative(int dx, int dy, double x, double y) {
        return evaluate(tables[dx][dy], x, y);
    }

    /** ψ̄ at (x, y). */
    public double value(double x, double y) {
        return evaluate(tables[0][0], x, y);
    }

    /** c1 ... c7 (a copy). */
    public double[] coefficients() {
        return coefficients.clone();
    }

    public double eps() { return eps; }
    public double kappa() { return kappa; }
    public double delta() { return delta; }
    public double a() { return a; }
}
