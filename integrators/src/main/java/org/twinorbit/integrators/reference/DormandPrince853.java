package org.twinorbit.integrators.reference;

import org.apache.commons.math3.util.FastMath;
import org.apache.commons.math3.util.Precision;

/**
 * The explicit Runge–Kutta pair of order 8 with 5th- and 3rd-order error estimators and its
 * 7th-order continuous extension (J. R. Dormand & P. J. Prince, J. Comput. Appl. Math. 6, 19,
 * 1980; E. Hairer, S. P. Nørsett & G. Wanner, Solving Ordinary Differential Equations I, 2nd ed.,
 * Springer, 1993, §II.10 for the method, the error norm and its dense output, §II.4 for the
 * step-size controller and the starting step; sections from memory), stepped one accepted step at
 * a time so that the caller samples and watches the orbit through {@link #interpolate} between
 * steps. It allocates nothing of its own per step; Commons Math's {@code FastMath.pow}, kept so that
 * the step control stays bit-identical to the library's, makes one 32-byte work array per step
 * ({@code Math.pow} would be 10x quicker and allocation-free, but changes the steps in the last bit).
 *
 * <p>It reproduces Commons Math 3.6's {@code DormandPrince853Integrator} run with minimum step 0:
 * the same coefficients (the closed forms in √6 and the rational weights), the same order of every
 * sum, the same error norm, controller (safety 0.9, step changes within [0.2, 10]) and starting
 * step, and the same dense-output formula, so that both give the same states to the last bit (the
 * tests compare them). It differs in cost only: the three extra stages of the dense output are
 * evaluated when a step is actually interpolated inside, not after every step.
 */
final class DormandPrince853 {

    /** The right-hand side dy/dt = f(t, y). */
    @FunctionalInterface
    interface Derivatives {
        /** @param t time (s) @param y state @param yDot receives dy/dt */
        void compute(double t, double[] y, double[] yDot);
    }

    private static final double S6 = Math.sqrt(6.0);

    // nodes c2..c12 (c13 = 1) and the coupling coefficients a_ij of the published tableau
    private static final double C2 = (12.0 - 2.0 * S6) / 135.0;
    private static final double C3 = (6.0 - S6) / 45.0;
    private static final double C4 = (6.0 - S6) / 30.0;
    private static final double C5 = (6.0 + S6) / 30.0;
    private static final double C6 = 1.0 / 3.0;
    private static final double C7 = 1.0 / 4.0;
    private static final double C8 = 4.0 / 13.0;
    private static final double C9 = 127.0 / 195.0;
    private static final double C10 = 3.0 / 5.0;
    private static final double C11 = 6.0 / 7.0;

    private static final double A21 = (12.0 - 2.0 * S6) / 135.0;
    private static final double A31 = (6.0 - S6) / 180.0;
    private static final double A32 = (6.0 - S6) / 60.0;
    private static final double A41 = (6.0 - S6) / 120.0;
    private static final double A43 = (6.0 - S6) / 40.0;
    private static final double A51 = (462.0 + 107.0 * S6) / 3000.0;
    private static final double A53 = (-402.0 - 197.0 * S6) / 1000.0;
    private static final double A54 = (168.0 + 73.0 * S6) / 375.0;
    private static final double A61 = 1.0 / 27.0;
    private static final double A64 = (16.0 + S6) / 108.0;
    private static final double A65 = (16.0 - S6) / 108.0;
    private static final double A71 = 19.0 / 512.0;
    private static final double A74 = (118.0 + 23.0 * S6) / 1024.0;
    private static final double A75 = (118.0 - 23.0 * S6) / 1024.0;
    private static final double A76 = -9.0 / 512.0;
    private static final double A81 = 13772.0 / 371293.0;
    private static final double A84 = (51544.0 + 4784.0 * S6) / 371293.0;
    private static final double A85 = (51544.0 - 4784.0 * S6) / 371293.0;
    private static final double A86 = -5688.0 / 371293.0;
    private static final double A87 = 3072.0 / 371293.0;
    private static final double A91 = 58656157643.0 / 93983540625.0;
    private static final double A94 = (-1324889724104.0 - 318801444819.0 * S6) / 626556937500.0;
    private static final double A95 = (-1324889724104.0 + 318801444819.0 * S6) / 626556937500.0;
    private static final double A96 = 96044563816.0 / 3480871875.0;
    private static final double A97 = 5682451879168.0 / 281950621875.0;
    private static final double A98 = -165125654.0 / 3796875.0;
    private static final double A101 = 8909899.0 / 18653125.0;
    private static final double A104 = (-4521408.0 - 1137963.0 * S6) / 2937500.0;
    private static final double A105 = (-4521408.0 + 1137963.0 * S6) / 2937500.0;
    private static final double A106 = 96663078.0 / 4553125.0;
    private static final double A107 = 2107245056.0 / 137915625.0;
    private static final double A108 = -4913652016.0 / 147609375.0;
    private static final double A109 = -78894270.0 / 3880452869.0;
    private static final double A111 = -20401265806.0 / 21769653311.0;
    private static final double A114 = (354216.0 + 94326.0 * S6) / 112847.0;
    private static final double A115 = (354216.0 - 94326.0 * S6) / 112847.0;
    private static final double A116 = -43306765128.0 / 5313852383.0;
    private static final double A117 = -20866708358144.0 / 1126708119789.0;
    private static final double A118 = 14886003438020.0 / 654632330667.0;
    private static final double A119 = 35290686222309375.0 / 14152473387134411.0;
    private static final double A1110 = -1477884375.0 / 485066827.0;
    private static final double A121 = 39815761.0 / 17514443.0;
    private static final double A124 = (-3457480.0 - 960905.0 * S6) / 551636.0;
    private static final double A125 = (-3457480.0 + 960905.0 * S6) / 551636.0;
    private static final double A126 = -844554132.0 / 47026969.0;
    private static final double A127 = 8444996352.0 / 302158619.0;
    private static final double A128 = -2509602342.0 / 877790785.0;
    private static final double A129 = -28388795297996250.0 / 3199510091356783.0;
    private static final double A1210 = 226716250.0 / 18341897.0;
    private static final double A1211 = 1371316744.0 / 2131383595.0;

    // 8th-order weights b_i (b2..b5 = b13 = 0); stage 13 is f at the new state (first same as last)
    private static final double B1 = 104257.0 / 1920240.0;
    private static final double B6 = 3399327.0 / 763840.0;
    private static final double B7 = 66578432.0 / 35198415.0;
    private static final double B8 = -1674902723.0 / 288716400.0;
    private static final double B9 = 54980371265625.0 / 176692375811392.0;
    private static final double B10 = -734375.0 / 4826304.0;
    private static final double B11 = 171414593.0 / 851261400.0;
    private static final double B12 = 137909.0 / 3084480.0;

    // the 5th-order (E1) and 3rd-order (E2) error estimators
    private static final double E101 = 116092271.0 / 8848465920.0;
    private static final double E106 = -1871647.0 / 1527680.0;
    private static final double E107 = -69799717.0 / 140793660.0;
    private static final double E108 = 1230164450203.0 / 739113984000.0;
    private static final double E109 = -1980813971228885.0 / 5654156025964544.0;
    private static final double E110 = 464500805.0 / 1389975552.0;
    private static final double E111 = 1606764981773.0 / 19613062656000.0;
    private static final double E112 = -137909.0 / 6168960.0;
    private static final double E201 = -364463.0 / 1920240.0;
    private static final double E206 = 3399327.0 / 763840.0;
    private static final double E207 = 66578432.0 / 35198415.0;
    private static final double E208 = -1674902723.0 / 288716400.0;
    private static final double E209 = -74684743568175.0 / 176692375811392.0;
    private static final double E210 = -734375.0 / 4826304.0;
    private static final double E211 = 171414593.0 / 851261400.0;
    private static final double E212 = 69869.0 / 3084480.0;

    // the three stages of the dense output, written relative to the new state y1 = y0 + h Σ b_i k_i
    private static final double C14 = 1.0 / 10.0;
    private static final double D1401 = 13481885573.0 / 240030000000.0 - B1;
    private static final double D1406 = 0.0 - B6;
    private static final double D1407 = 139418837528.0 / 549975234375.0 - B7;
    private static final double D1408 = -11108320068443.0 / 45111937500000.0 - B8;
    private static final double D1409 = -1769651421925959.0 / 14249385146080000.0 - B9;
    private static final double D1410 = 57799439.0 / 377055000.0 - B10;
    private static final double D1411 = 793322643029.0 / 96734250000000.0 - B11;
    private static final double D1412 = 1458939311.0 / 192780000000.0 - B12;
    private static final double D1413 = -4149.0 / 500000.0;
    private static final double C15 = 1.0 / 5.0;
    private static final double D1501 = 1595561272731.0 / 50120273500000.0 - B1;
    private static final double D1506 = 975183916491.0 / 34457688031250.0 - B6;
    private static final double D1507 = 38492013932672.0 / 718912673015625.0 - B7;
    private static final double D1508 = -1114881286517557.0 / 20298710767500000.0 - B8;
    private static final double D1509 = 0.0 - B9;
    private static final double D1510 = 0.0 - B10;
    private static final double D1511 = -2538710946863.0 / 23431227861250000.0 - B11;
    private static final double D1512 = 8824659001.0 / 23066716781250.0 - B12;
    private static final double D1513 = -11518334563.0 / 33831184612500.0;
    private static final double D1514 = 1912306948.0 / 13532473845.0;
    private static final double C16 = 7.0 / 9.0;
    private static final double D1601 = -13613986967.0 / 31741908048.0 - B1;
    private static final double D1606 = -4755612631.0 / 1012344804.0 - B6;
    private static final double D1607 = 42939257944576.0 / 5588559685701.0 - B7;
    private static final double D1608 = 77881972900277.0 / 19140370552944.0 - B8;
    private static final double D1609 = 22719829234375.0 / 63689648654052.0 - B9;
    private static final double D1610 = 0.0 - B10;
    private static final double D1611 = 0.0 - B11;
    private static final double D1612 = 0.0 - B12;
    private static final double D1613 = -1199007803.0 / 857031517296.0;
    private static final double D1614 = 157882067000.0 / 53564469831.0;
    private static final double D1615 = -290468882375.0 / 31741908048.0;

    // weights of the 4th to 7th coefficient of the dense-output polynomial on stages 1, 6–16
    private static final double P4_1 = -17751989329.0 / 2106076560.0;
    private static final double P4_6 = 4272954039.0 / 7539864640.0;
    private static final double P4_7 = -118476319744.0 / 38604839385.0;
    private static final double P4_8 = 755123450731.0 / 316657731600.0;
    private static final double P4_9 = 3692384461234828125.0 / 1744130441634250432.0;
    private static final double P4_10 = -4612609375.0 / 5293382976.0;
    private static final double P4_11 = 2091772278379.0 / 933644586600.0;
    private static final double P4_12 = 2136624137.0 / 3382989120.0;
    private static final double P4_13 = -126493.0 / 1421424.0;
    private static final double P4_14 = 98350000.0 / 5419179.0;
    private static final double P4_15 = -18878125.0 / 2053168.0;
    private static final double P4_16 = -1944542619.0 / 438351368.0;
    private static final double P5_1 = 32941697297.0 / 3159114840.0;
    private static final double P5_6 = 456696183123.0 / 1884966160.0;
    private static final double P5_7 = 19132610714624.0 / 115814518155.0;
    private static final double P5_8 = -177904688592943.0 / 474986597400.0;
    private static final double P5_9 = -4821139941836765625.0 / 218016305204281304.0;
    private static final double P5_10 = 30702015625.0 / 3970037232.0;
    private static final double P5_11 = -85916079474274.0 / 2800933759800.0;
    private static final double P5_12 = -5919468007.0 / 634310460.0;
    private static final double P5_13 = 2479159.0 / 157936.0;
    private static final double P5_14 = -18750000.0 / 602131.0;
    private static final double P5_15 = -19203125.0 / 2053168.0;
    private static final double P5_16 = 15700361463.0 / 438351368.0;
    private static final double P6_1 = 12627015655.0 / 631822968.0;
    private static final double P6_6 = -72955222965.0 / 188496616.0;
    private static final double P6_7 = -13145744952320.0 / 69488710893.0;
    private static final double P6_8 = 30084216194513.0 / 56998391688.0;
    private static final double P6_9 = -296858761006640625.0 / 25648977082856624.0;
    private static final double P6_10 = 569140625.0 / 82709109.0;
    private static final double P6_11 = -18684190637.0 / 18672891732.0;
    private static final double P6_12 = 69644045.0 / 89549712.0;
    private static final double P6_13 = -11847025.0 / 4264272.0;
    private static final double P6_14 = -978650000.0 / 16257537.0;
    private static final double P6_15 = 519371875.0 / 6159504.0;
    private static final double P6_16 = 5256837225.0 / 438351368.0;
    private static final double P7_1 = -450944925.0 / 17550638.0;
    private static final double P7_6 = -14532122925.0 / 94248308.0;
    private static final double P7_7 = -595876966400.0 / 2573655959.0;
    private static final double P7_8 = 188748653015.0 / 527762886.0;
    private static final double P7_9 = 2545485458115234375.0 / 27252038150535163.0;
    private static final double P7_10 = -1376953125.0 / 36759604.0;
    private static final double P7_11 = 53995596795.0 / 518691437.0;
    private static final double P7_12 = 210311225.0 / 7047894.0;
    private static final double P7_13 = -1718875.0 / 39484.0;
    private static final double P7_14 = 58000000.0 / 602131.0;
    private static final double P7_15 = -1546875.0 / 39484.0;
    private static final double P7_16 = -1262172375.0 / 8429834.0;

    private static final double SAFETY = 0.9;
    private static final double MIN_REDUCTION = 0.2;
    private static final double MAX_GROWTH = 10.0;
    private static final double EXPONENT = -1.0 / 8;

    /** State size: the Lorentz state (x, u). A constant, so that the compiler unrolls every loop. */
    static final int N = 6;

    private final Derivatives f;
    private final double[] atol;
    private final double[] rtol;
    private final double maxStep;

    private final double[] k1, k2, k3, k4, k5, k6, k7, k8, k9, k10, k11, k12, k13, k14, k15, k16;
    /** The first stage of the last accepted step (k1 already holds the next step's). */
    private final double[] first;
    private final double[] y0;
    private final double[] y1;
    private final double[] tmp;
    /** Coefficients of the dense-output polynomial of the last step. */
    private final double[] v0, v1, v2, v3, v4, v5, v6;

    private double tEnd;
    /** Start and end (s) of the last accepted step. */
    private double tPrev;
    private double tCur;
    /** The step (s) the next attempt starts from. */
    private double hNext;
    private boolean denseReady;

    /**
     * @param absoluteTolerance per component (units of the component)
     * @param relativeTolerance per component
     * @param maxStep largest step (s)
     */
    DormandPrince853(Derivatives f, double[] absoluteTolerance, double[] relativeTolerance, double maxStep) {
        if (absoluteTolerance.length != N || relativeTolerance.length != N) {
            throw new IllegalArgumentException("tolerances must have " + N + " components");
        }
        this.f = f;
        this.atol = absoluteTolerance.clone();
        this.rtol = relativeTolerance.clone();
        this.maxStep = Math.abs(maxStep);
        k1 = new double[N];
        k2 = new double[N];
        k3 = new double[N];
        k4 = new double[N];
        k5 = new double[N];
        k6 = new double[N];
        k7 = new double[N];
        k8 = new double[N];
        k9 = new double[N];
        k10 = new double[N];
        k11 = new double[N];
        k12 = new double[N];
        k13 = new double[N];
        k14 = new double[N];
        k15 = new double[N];
        k16 = new double[N];
        first = new double[N];
        y0 = new double[N];
        y1 = new double[N];
        tmp = new double[N];
        v0 = new double[N];
        v1 = new double[N];
        v2 = new double[N];
        v3 = new double[N];
        v4 = new double[N];
        v5 = new double[N];
        v6 = new double[N];
    }

    /**
     * Starts at (t0, y) towards tEnd (forward only): the first stage and the starting step.
     *
     * @param t0 start time (s) @param tEnd end time (s), after t0
     */
    void start(double t0, double[] y, double tEnd) {
        double threshold = 1000 * Math.ulp(Math.max(Math.abs(t0), Math.abs(tEnd)));
        if (!(tEnd - t0 > threshold)) {
            throw new IllegalArgumentException("integration span " + (tEnd - t0) + " s is too short");
        }
        this.tEnd = tEnd;
        System.arraycopy(y, 0, y1, 0, N);
        tPrev = t0;
        tCur = t0;
        f.compute(t0, y1, k1);
        hNext = startingStep(t0);
    }

    /**
     * Starting step (Hairer, Nørsett & Wanner 1993, §II.4): an Euler trial of 0.01‖y‖/‖f‖, then
     * h with h⁸ max(‖f‖, ‖f'‖) = 0.01, at most 100 times the trial, within (0, maxStep].
     */
    private double startingStep(double t0) {
        double[] scale = v0;
        double yNorm2 = 0;
        double fNorm2 = 0;
        for (int j = 0; j < N; j++) {
            scale[j] = atol[j] + rtol[j] * Math.abs(y1[j]);
            double r = y1[j] / scale[j];
            yNorm2 += r * r;
            r = k1[j] / scale[j];
            fNorm2 += r * r;
        }
        double h = (yNorm2 < 1.0e-10 || fNorm2 < 1.0e-10) ? 1.0e-6 : 0.01 * Math.sqrt(yNorm2 / fNorm2);
        for (int j = 0; j < N; j++) {
            tmp[j] = y1[j] + h * k1[j];
        }
        f.compute(t0 + h, tmp, k2);
        double d2 = 0;
        for (int j = 0; j < N; j++) {
            double r = (k2[j] - k1[j]) / scale[j];
            d2 += r * r;
        }
        d2 = Math.sqrt(d2) / h;
        double maxInv2 = Math.max(Math.sqrt(fNorm2), d2);
        double h1 = maxInv2 < 1.0e-15 ? Math.max(1.0e-6, 0.001 * Math.abs(h)) : FastMath.pow(0.01 / maxInv2, 1.0 / 8);
        h = Math.min(100.0 * Math.abs(h), h1);
        h = Math.max(h, 1.0e-12 * Math.abs(t0));
        return Math.min(h, maxStep);
    }

    /** Takes one accepted step; afterwards [{@link #previousTime}, {@link #currentTime}] is that step. */
    void step() {
        System.arraycopy(y1, 0, y0, 0, N);
        double t = tCur;
        double h;
        double error;
        do {
            h = hNext;
            if (t + h >= tEnd) {
                h = tEnd - t;
            }
            attempt(t, h);
            error = error(h);
            if (error >= 1.0) {
                hNext = Math.min(maxStep, h * factor(error));
            }
        } while (error >= 1.0);
        // k13 = f(t + h, y1) is the first stage of the next step
        System.arraycopy(k1, 0, first, 0, N);
        System.arraycopy(k13, 0, k1, 0, N);
        tPrev = t;
        tCur = t + h;
        denseReady = false;
        double scaled = h * factor(error);
        double next = Math.min(scaled, maxStep);
        hNext = tCur + next >= tEnd ? tEnd - tCur : next;
    }

    private static double factor(double error) {
        return Math.min(MAX_GROWTH, Math.max(MIN_REDUCTION, SAFETY * FastMath.pow(error, EXPONENT)));
    }

    /** Stages 2–13 from y0 over h; leaves the 8th-order solution in y1. Sums in tableau order. */
    private void attempt(double t, double h) {
        double[] y = y0;
        double[] s = tmp;
        for (int j = 0; j < N; j++) {
            s[j] = y[j] + h * (A21 * k1[j]);
        }
        f.compute(t + C2 * h, s, k2);
        for (int j = 0; j < N; j++) {
            s[j] = y[j] + h * (A31 * k1[j] + A32 * k2[j]);
        }
        f.compute(t + C3 * h, s, k3);
        for (int j = 0; j < N; j++) {
            s[j] = y[j] + h * (A41 * k1[j] + A43 * k3[j]);
        }
        f.compute(t + C4 * h, s, k4);
        for (int j = 0; j < N; j++) {
            s[j] = y[j] + h * (A51 * k1[j] + A53 * k3[j] + A54 * k4[j]);
        }
        f.compute(t + C5 * h, s, k5);
        for (int j = 0; j < N; j++) {
            s[j] = y[j] + h * (A61 * k1[j] + A64 * k4[j] + A65 * k5[j]);
        }
        f.compute(t + C6 * h, s, k6);
        for (int j = 0; j < N; j++) {
            s[j] = y[j] + h * (A71 * k1[j] + A74 * k4[j] + A75 * k5[j] + A76 * k6[j]);
        }
        f.compute(t + C7 * h, s, k7);
        for (int j = 0; j < N; j++) {
            s[j] = y[j] + h * (A81 * k1[j] + A84 * k4[j] + A85 * k5[j] + A86 * k6[j] + A87 * k7[j]);
        }
        f.compute(t + C8 * h, s, k8);
        for (int j = 0; j < N; j++) {
            s[j] = y[j] + h * (A91 * k1[j] + A94 * k4[j] + A95 * k5[j] + A96 * k6[j] + A97 * k7[j] + A98 * k8[j]);
        }
        f.compute(t + C9 * h, s, k9);
        for (int j = 0; j < N; j++) {
            s[j] = y[j] + h * (A101 * k1[j] + A104 * k4[j] + A105 * k5[j] + A106 * k6[j] + A107 * k7[j]
                    + A108 * k8[j] + A109 * k9[j]);
        }
        f.compute(t + C10 * h, s, k10);
        for (int j = 0; j < N; j++) {
            s[j] = y[j] + h * (A111 * k1[j] + A114 * k4[j] + A115 * k5[j] + A116 * k6[j] + A117 * k7[j]
                    + A118 * k8[j] + A119 * k9[j] + A1110 * k10[j]);
        }
        f.compute(t + C11 * h, s, k11);
        for (int j = 0; j < N; j++) {
            s[j] = y[j] + h * (A121 * k1[j] + A124 * k4[j] + A125 * k5[j] + A126 * k6[j] + A127 * k7[j]
                    + A128 * k8[j] + A129 * k9[j] + A1210 * k10[j] + A1211 * k11[j]);
        }
        f.compute(t + h, s, k12);
        for (int j = 0; j < N; j++) {
            y1[j] = y[j] + h * (B1 * k1[j] + B6 * k6[j] + B7 * k7[j] + B8 * k8[j] + B9 * k9[j] + B10 * k10[j]
                    + B11 * k11[j] + B12 * k12[j]);
        }
        f.compute(t + h, y1, k13);
    }

    /**
     * The error norm of the pair (Hairer, Nørsett & Wanner 1993, §II.10): the RMS 5th-order
     * estimate scaled by its ratio to the 3rd-order one, |h| E5 / sqrt(n (E5 + 0.01 E3)).
     */
    private double error(double h) {
        double e1 = 0;
        double e2 = 0;
        for (int j = 0; j < N; j++) {
            double s1 = E101 * k1[j] + E106 * k6[j] + E107 * k7[j] + E108 * k8[j] + E109 * k9[j] + E110 * k10[j]
                    + E111 * k11[j] + E112 * k12[j];
            double s2 = E201 * k1[j] + E206 * k6[j] + E207 * k7[j] + E208 * k8[j] + E209 * k9[j] + E210 * k10[j]
                    + E211 * k11[j] + E212 * k12[j];
            double tol = atol[j] + rtol[j] * Math.max(Math.abs(y0[j]), Math.abs(y1[j]));
            double r1 = s1 / tol;
            e1 += r1 * r1;
            double r2 = s2 / tol;
            e2 += r2 * r2;
        }
        double den = e1 + 0.01 * e2;
        if (den <= 0.0) {
            den = 1.0;
        }
        return Math.abs(h) * e1 / Math.sqrt(N * den);
    }

    /** Start (s) of the last accepted step. */
    double previousTime() {
        return tPrev;
    }

    /** End (s) of the last accepted step. */
    double currentTime() {
        return tCur;
    }

    /** The state at {@link #currentTime}; do not modify. */
    double[] state() {
        return y1;
    }

    /** True when the last step reached the end time (to one ulp). */
    boolean atEnd() {
        return Precision.equals(tCur, tEnd, 1);
    }

    /**
     * The dense output at time t (s) inside the last step, into out: the 7th-order continuous
     * extension, from the start of the step in its first half and from its end in the second.
     */
    void interpolate(double t, double[] out) {
        if (t == tCur) {
            // the formula gives y1 exactly there; no need for the extra stages
            System.arraycopy(y1, 0, out, 0, N);
            return;
        }
        if (!denseReady) {
            prepareDense();
        }
        double h = tCur - tPrev;
        double oneMinusThetaH = tCur - t;
        double theta = h == 0 ? 0 : (h - oneMinusThetaH) / h;
        double eta = 1 - theta;
        if (theta <= 0.5) {
            for (int i = 0; i < N; i++) {
                out[i] = y0[i] + theta * h * (v0[i] + eta * (v1[i] + theta * (v2[i] + eta * (v3[i]
                        + theta * (v4[i] + eta * (v5[i] + theta * v6[i]))))));
            }
        } else {
            for (int i = 0; i < N; i++) {
                out[i] = y1[i] - oneMinusThetaH * (v0[i] - theta * (v1[i] + theta * (v2[i] + eta * (v3[i]
                        + theta * (v4[i] + eta * (v5[i] + theta * v6[i]))))));
            }
        }
    }

    /** The three extra stages of the dense output and the polynomial's coefficients, once per step. */
    private void prepareDense() {
        double h = tCur - tPrev;
        double[] s = tmp;
        for (int j = 0; j < N; j++) {
            s[j] = y1[j] + h * (D1401 * first[j] + D1406 * k6[j] + D1407 * k7[j] + D1408 * k8[j] + D1409 * k9[j]
                    + D1410 * k10[j] + D1411 * k11[j] + D1412 * k12[j] + D1413 * k13[j]);
        }
        f.compute(tPrev + C14 * h, s, k14);
        for (int j = 0; j < N; j++) {
            s[j] = y1[j] + h * (D1501 * first[j] + D1506 * k6[j] + D1507 * k7[j] + D1508 * k8[j] + D1509 * k9[j]
                    + D1510 * k10[j] + D1511 * k11[j] + D1512 * k12[j] + D1513 * k13[j] + D1514 * k14[j]);
        }
        f.compute(tPrev + C15 * h, s, k15);
        for (int j = 0; j < N; j++) {
            s[j] = y1[j] + h * (D1601 * first[j] + D1606 * k6[j] + D1607 * k7[j] + D1608 * k8[j] + D1609 * k9[j]
                    + D1610 * k10[j] + D1611 * k11[j] + D1612 * k12[j] + D1613 * k13[j] + D1614 * k14[j]
                    + D1615 * k15[j]);
        }
        f.compute(tPrev + C16 * h, s, k16);
        for (int i = 0; i < N; i++) {
            double d1 = first[i];
            double b = B1 * d1 + B6 * k6[i] + B7 * k7[i] + B8 * k8[i] + B9 * k9[i] + B10 * k10[i] + B11 * k11[i]
                    + B12 * k12[i];
            v0[i] = b;
            v1[i] = d1 - b;
            v2[i] = b - v1[i] - k13[i];
            v3[i] = P4_1 * d1 + P4_6 * k6[i] + P4_7 * k7[i] + P4_8 * k8[i]
                    + P4_9 * k9[i] + P4_10 * k10[i] + P4_11 * k11[i] + P4_12 * k12[i]
                    + P4_13 * k13[i] + P4_14 * k14[i] + P4_15 * k15[i] + P4_16 * k16[i];
            v4[i] = P5_1 * d1 + P5_6 * k6[i] + P5_7 * k7[i] + P5_8 * k8[i]
                    + P5_9 * k9[i] + P5_10 * k10[i] + P5_11 * k11[i] + P5_12 * k12[i]
                    + P5_13 * k13[i] + P5_14 * k14[i] + P5_15 * k15[i] + P5_16 * k16[i];
            v5[i] = P6_1 * d1 + P6_6 * k6[i] + P6_7 * k7[i] + P6_8 * k8[i]
                    + P6_9 * k9[i] + P6_10 * k10[i] + P6_11 * k11[i] + P6_12 * k12[i]
                    + P6_13 * k13[i] + P6_14 * k14[i] + P6_15 * k15[i] + P6_16 * k16[i];
            v6[i] = P7_1 * d1 + P7_6 * k6[i] + P7_7 * k7[i] + P7_8 * k8[i]
                    + P7_9 * k9[i] + P7_10 * k10[i] + P7_11 * k11[i] + P7_12 * k12[i]
                    + P7_13 * k13[i] + P7_14 * k14[i] + P7_15 * k15[i] + P7_16 * k16[i];
        }
        denseReady = true;
    }
}
