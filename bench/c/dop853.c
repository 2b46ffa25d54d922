/*
 * dop853.c -- plain-C speed yardstick for twinorbit's full-orbit reference
 * (FullOrbitReference: Commons Math's DormandPrince853Integrator on the
 * relativistic Lorentz equations).  Same equations, same tolerances, same
 * method; plain doubles, no library.  It reports steps, field evaluations and
 * CPU time, so the Java cost per evaluation can be put beside it.
 *
 * Equations, state y = (x, u), u = gamma v (J. D. Jackson, Classical
 * Electrodynamics, 3rd ed., 1999, ch. 12):
 *     dx/dt = u/gamma,  du/dt = (q/m) u x B / gamma,  gamma = sqrt(1 + u^2/c^2)
 *
 * Method: the explicit Runge-Kutta method of order 8 with the 5th- and 3rd-order
 * error estimators of DOP853 (E. Hairer, S. P. Norsett & G. Wanner, Solving
 * Ordinary Differential Equations I, 2nd ed., Springer, 1993, sec. II.10,
 * section from memory); coefficients as published with that code.  Error norm,
 * step-size controller and starting step as published (ibid., sec. II.4 and
 * the DOP853 code).  Left out: dense output, stiffness detection, events.
 *
 *   ./dop853 [dipole|mirror|gradient|uniform] [eps=E | ev=W] [pitch=DEG] [n=N]
 *            [t=SECONDS | gyro=PERIODS] [rtol=R] [reps=K]
 *   ./dop853 caseB      dipole eps=0.0124 t=107.8
 *   ./dop853 check      physics checks, [PASS]/[FAIL], exit status 1 on failure
 *
 * Defaults: dipole, eps 0.0309, pitch 30, n 8, t 43.28 s (dipole) or 100
 * initial gyroperiods (other fields), rtol 1e-10, reps 1 (reps > 1 repeats the
 * whole ensemble inside the timed region, for longer timings).
 */
#define _POSIX_C_SOURCE 200112L
#include <math.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>
#include <time.h>

#define NOINLINE __attribute__((noinline))
#define INLINE static inline __attribute__((always_inline))

/* CODATA 2018 (E. Tiesinga et al., Rev. Mod. Phys. 93, 025010, 2021); c and e
 * are exact in the 2019 SI.  Written in the same operation order as the Java
 * (shared/Constants, Relativity, LorentzEquations), so that initial states agree. */
static const double C_LIGHT = 299792458.0;      /* m/s */
static const double Q_E = 1.602176634e-19;      /* C, proton charge */
static const double M_P = 1.67262192369e-27;    /* kg, proton mass */
static const double PI = 3.14159265358979323846;
#define INV_C2 (1.0 / (C_LIGHT * C_LIGHT))

/* ------------------------------------------------------ the DOP853 tableau */
/* Dormand-Prince 8(5,3), as published with DOP853 (Hairer, Norsett & Wanner,
 * 1993).  Stage i uses a_ij, j < i; zero entries are omitted.  The nodes c_i
 * are not needed: the fields are static, so f does not depend on t. */
static const double
A21 = 5.26001519587677318785587544488e-2,
A31 = 1.97250569845378994544595329183e-2, A32 = 5.91751709536136983633785987549e-2,
A41 = 2.95875854768068491816892993775e-2, A43 = 8.87627564304205475450678981324e-2,
A51 = 2.41365134159266685502369798665e-1, A53 = -8.84549479328286085344864962717e-1,
A54 = 9.24834003261792003115737966543e-1,
A61 = 3.7037037037037037037037037037e-2, A64 = 1.70828608729473871279604482173e-1,
A65 = 1.25467687566822425016691814123e-1,
A71 = 3.7109375e-2, A74 = 1.70252211019544039314978060272e-1,
A75 = 6.02165389804559606850219397283e-2, A76 = -1.7578125e-2,
A81 = 3.70920001185047927108779319836e-2, A84 = 1.70383925712239993810214054705e-1,
A85 = 1.07262030446373284651809199168e-1, A86 = -1.53194377486244017527936158236e-2,
A87 = 8.27378916381402288758473766002e-3,
A91 = 6.24110958716075717114429577812e-1, A94 = -3.36089262944694129406857109825e0,
A95 = -8.68219346841726006818189891453e-1, A96 = 2.75920996994467083049415600797e1,
A97 = 2.01540675504778934086186788979e1, A98 = -4.34898841810699588477366255144e1,
A101 = 4.77662536438264365890433908527e-1, A104 = -2.48811461997166764192642586468e0,
A105 = -5.90290826836842996371446475743e-1, A106 = 2.12300514481811942347288949897e1,
A107 = 1.52792336328824235832596922938e1, A108 = -3.32882109689848629194453265587e1,
A109 = -2.03312017085086261358222928593e-2,
A111 = -9.3714243008598732571704021658e-1, A114 = 5.18637242884406370830023853209e0,
A115 = 1.09143734899672957818500254654e0, A116 = -8.14978701074692612513997267357e0,
A117 = -1.85200656599969598641566180701e1, A118 = 2.27394870993505042818970056734e1,
A119 = 2.49360555267965238987089396762e0, A1110 = -3.0467644718982195003823669022e0,
A121 = 2.27331014751653820792359768449e0, A124 = -1.05344954667372501984066689879e1,
A125 = -2.00087205822486249909675718444e0, A126 = -1.79589318631187989172765950534e1,
A127 = 2.79488845294199600508499808837e1, A128 = -2.85899827713502369474065508674e0,
A129 = -8.87285693353062954433549289258e0, A1210 = 1.23605671757943030647266201528e1,
A1211 = 6.43392746015763530355970484046e-1,
/* 8th-order weights (b2..b5 = 0) */
B1 = 5.42937341165687622380535766363e-2, B6 = 4.45031289275240888144113950566e0,
B7 = 1.89151789931450038304281599044e0, B8 = -5.8012039600105847814672114227e0,
B9 = 3.1116436695781989440891606237e-1, B10 = -1.52160949662516078556178806805e-1,
B11 = 2.01365400804030348374776537501e-1, B12 = 4.47106157277725905176885569043e-2,
/* 3rd-order embedded weights on stages 1, 9, 12 */
BHH1 = 0.244094488188976377952755905512e0, BHH2 = 0.733846688281611857341361741547e0,
BHH3 = 0.220588235294117647058823529412e-1,
/* 5th-order error estimator: b minus a 5th-order embedded method */
ER1 = 0.1312004499419488073250102996e-1, ER6 = -0.1225156446376204440720569753e1,
ER7 = -0.4957589496572501915214079952e0, ER8 = 0.1664377182454986536961530415e1,
ER9 = -0.3503288487499736816886487290e0, ER10 = 0.3341791187130174790297318841e0,
ER11 = 0.8192320648511571246570742613e-1, ER12 = -0.2235530786388629525884427845e-1;

/* Step-size control, published DOP853 defaults: safety 0.9, the new step
 * within [FAC1, FAC2] times the old one.  (Commons Math uses 0.2 and 10.) */
static const double SAFE = 0.9, FAC1 = 0.333, FAC2 = 6.0;

/* ---------------------------------------------------------------- fields */

enum { DIPOLE, MIRROR, GRADIENT, UNIFORM };
static const char *FIELD_NAMES[] = {"dipole", "mirror", "gradient", "uniform"};

typedef struct {
    int kind;
    double k;        /* dipole: B_s R_p^3 (T m^3) */
    double b0, km;   /* mirror: B0 (T), (Rm - 1)/Lm^2 (1/m^2); gradient, uniform: B0 (T) */
    double lg;       /* gradient: Lg (m) */
    double L;        /* length for eps = rho0/L (m); 0 for uniform (none) */
    double X[3];     /* default guiding centre (m) */
} field;

/* Parameters pass through a volatile so that the compiler cannot fold their
 * values into the loops (e.g. drop B0 = 1 multiplications). */
static double opaque(double x) { volatile double v = x; return v; }

/* The library's defaults (fields/{Dipole,Mirror,Gradient}Field.java). */
static field make_field(int kind)
{
    field f;
    memset(&f, 0, sizeof f);
    f.kind = kind;
    if (kind == DIPOLE) {             /* B_s = 3e-5 T, R_p = 6.4e6 m, lshell 4 */
        double bs = opaque(3e-5), rp = opaque(6.4e6), ls = 4.0;
        f.k = bs * rp * rp * rp;
        f.L = ls * rp / 3.0;          /* |B|/|grad B| at the equatorial start */
        f.X[0] = ls * rp;
    } else if (kind == MIRROR) {      /* B0 = 0.5 T, Rm = 4, Lm = 1 m */
        double lm = opaque(1.0);
        f.b0 = opaque(0.5);
        f.km = (opaque(4.0) - 1.0) / (lm * lm);
        f.L = lm;
    } else if (kind == GRADIENT) {    /* B0 = 1 T, Lg = 1 m */
        f.b0 = opaque(1.0);
        f.lg = opaque(1.0);
        f.L = f.lg;
    } else {                          /* uniform B0 = 1 T along z, for the checks */
        f.b0 = opaque(1.0);
    }
    return f;
}

/* B(x) (T), written as in the Java field classes, operation for operation.
 * kind is a compile-time constant at every call (see the wrappers below). */
INLINE void bfield(int kind, const field *f, double x, double y, double z, double *B)
{
    if (kind == DIPOLE) {         /* B = k [3 (m.r) r - m r^2] / r^5, m = -z */
        double r2 = x * x + y * y + z * z;
        double inv2 = 1.0 / r2;
        double inv5 = inv2 * inv2 / sqrt(r2);
        B[0] = -3.0 * f->k * x * z * inv5;
        B[1] = -3.0 * f->k * y * z * inv5;
        B[2] = f->k * (x * x + y * y - 2.0 * z * z) * inv5;
    } else if (kind == MIRROR) {  /* paraxial: B_z = B0 (1 + km z^2), B_r = -(r/2) dB_z/dz */
        double bk = f->b0 * f->km;
        B[0] = -bk * x * z;
        B[1] = -bk * y * z;
        B[2] = f->b0 * (1.0 + f->km * z * z);
    } else if (kind == GRADIENT) {
        B[0] = 0.0;
        B[1] = 0.0;
        B[2] = f->b0 * (1.0 + x / f->lg);
    } else {
        B[0] = 0.0;
        B[1] = 0.0;
        B[2] = f->b0;
    }
}

/* Right-hand side, one field evaluation (as LorentzEquations.derivatives). */
INLINE void lorentz(int kind, const field *f, double qm, const double *y, double *d)
{
    double B[3];
    bfield(kind, f, y[0], y[1], y[2], B);
    double ux = y[3], uy = y[4], uz = y[5];
    double ig = 1.0 / sqrt(1.0 + (ux * ux + uy * uy + uz * uz) * INV_C2);
    d[0] = ux * ig;
    d[1] = uy * ig;
    d[2] = uz * ig;
    d[3] = qm * (ig * (uy * B[2] - uz * B[1]));
    d[4] = qm * (ig * (uz * B[0] - ux * B[2]));
    d[5] = qm * (ig * (ux * B[1] - uy * B[0]));
}

/* ------------------------------------------------------------ integrator */

typedef struct {
    long nacc, nrej, nfev;   /* accepted and rejected steps, field evaluations */
    double dEmax;            /* max |gamma - gamma0|/(gamma0 - 1) after accepted steps */
    int fail;                /* step size underflow or non-finite state */
} stats;

static double sq(double a) { return a * a; }

/* Integrates y (6 components) from t = 0 to tend in place.  atol: per
 * component; rtol: all components. */
INLINE void integrate(int kind, const field *f, double qm, double *y, double tend,
                      double rtol, const double *atol, stats *st)
{
    double k1[6], k2[6], k3[6], k4[6], k5[6], k6[6], k7[6], k8[6], k9[6], k10[6],
           k11[6], k12[6], yt[6], yn[6], sk[6];
    const double hmax = tend;           /* as both codes: the whole span */
    double u2_0 = y[3] * y[3] + y[4] * y[4] + y[5] * y[5];
    double g0 = sqrt(1.0 + u2_0 * INV_C2);
    lorentz(kind, f, qm, y, k1);
    st->nfev++;

    /* Starting step (Hairer, Norsett & Wanner 1993, sec. II.4; DOP853's HINIT):
     * an Euler trial step of size h0 = 0.01 |y0|/|f0|, then h1 from
     * h1^8 max(|f0|, |f'|) = 0.01 with f' the difference quotient of f;
     * h = min(100 h0, h1, hmax).  Norms are weighted by atol + rtol |y0|. */
    double dnf = 0.0, dny = 0.0, der2 = 0.0, h;
    for (int i = 0; i < 6; i++) {
        sk[i] = atol[i] + rtol * fabs(y[i]);
        dnf += sq(k1[i] / sk[i]);
        dny += sq(y[i] / sk[i]);
    }
    h = (dnf <= 1e-10 || dny <= 1e-10) ? 1e-6 : sqrt(dny / dnf) * 0.01;
    h = fmin(h, hmax);
    for (int i = 0; i < 6; i++) yt[i] = y[i] + h * k1[i];
    lorentz(kind, f, qm, yt, k2);
    st->nfev++;
    for (int i = 0; i < 6; i++) der2 += sq((k2[i] - k1[i]) / sk[i]);
    der2 = sqrt(der2) / h;
    double der12 = fmax(fabs(der2), sqrt(dnf));
    double h1 = der12 <= 1e-15 ? fmax(1e-6, fabs(h) * 1e-3) : pow(0.01 / der12, 1.0 / 8.0);
    h = fmin(fmin(100.0 * h, h1), hmax);

    double t = 0.0;
    int last = 0, reject = 0;
    for (;;) {
        if (0.1 * h <= t * 2.2e-16 || st->fail) { st->fail = 1; return; }   /* underflow */
        if (t + 1.01 * h - tend > 0.0) { h = tend - t; last = 1; }        /* hit tend */

        /* the 11 further stages: yt = y + h sum_j a_ij k_j, k_i = f(yt) */
#define STAGE(K, SUM) do { for (int i = 0; i < 6; i++) yt[i] = y[i] + h * (SUM); \
                           lorentz(kind, f, qm, yt, K); } while (0)
        STAGE(k2, A21 * k1[i]);
        STAGE(k3, A31 * k1[i] + A32 * k2[i]);
        STAGE(k4, A41 * k1[i] + A43 * k3[i]);
        STAGE(k5, A51 * k1[i] + A53 * k3[i] + A54 * k4[i]);
        STAGE(k6, A61 * k1[i] + A64 * k4[i] + A65 * k5[i]);
        STAGE(k7, A71 * k1[i] + A74 * k4[i] + A75 * k5[i] + A76 * k6[i]);
        STAGE(k8, A81 * k1[i] + A84 * k4[i] + A85 * k5[i] + A86 * k6[i] + A87 * k7[i]);
        STAGE(k9, A91 * k1[i] + A94 * k4[i] + A95 * k5[i] + A96 * k6[i] + A97 * k7[i]
                  + A98 * k8[i]);
        STAGE(k10, A101 * k1[i] + A104 * k4[i] + A105 * k5[i] + A106 * k6[i] + A107 * k7[i]
                   + A108 * k8[i] + A109 * k9[i]);
        STAGE(k11, A111 * k1[i] + A114 * k4[i] + A115 * k5[i] + A116 * k6[i] + A117 * k7[i]
                   + A118 * k8[i] + A119 * k9[i] + A1110 * k10[i]);
        STAGE(k12, A121 * k1[i] + A124 * k4[i] + A125 * k5[i] + A126 * k6[i] + A127 * k7[i]
                   + A128 * k8[i] + A129 * k9[i] + A1210 * k10[i] + A1211 * k11[i]);
#undef STAGE
        st->nfev += 11;

        /* 8th-order solution and the two error estimates.  Error norm of DOP853
         * (Hairer, Norsett & Wanner 1993): with sk_i = atol_i + rtol max(|y_i|, |yn_i|),
         * E5 = sum (e5_i/sk_i)^2, E3 = sum (e3_i/sk_i)^2 over the n = 6 components,
         * err = |h| E5 / sqrt(n (E5 + 0.01 E3)), i.e. the RMS 5th-order estimate
         * scaled by its ratio to the 3rd-order one, which behaves like an
         * 8th-order error as h -> 0. */
        double e5 = 0.0, e3 = 0.0;
        for (int i = 0; i < 6; i++) {
            double kb = B1 * k1[i] + B6 * k6[i] + B7 * k7[i] + B8 * k8[i] + B9 * k9[i]
                        + B10 * k10[i] + B11 * k11[i] + B12 * k12[i];
            yn[i] = y[i] + h * kb;
            double s = atol[i] + rtol * fmax(fabs(y[i]), fabs(yn[i]));
            double d3 = kb - BHH1 * k1[i] - BHH2 * k9[i] - BHH3 * k12[i];
            double d5 = ER1 * k1[i] + ER6 * k6[i] + ER7 * k7[i] + ER8 * k8[i] + ER9 * k9[i]
                        + ER10 * k10[i] + ER11 * k11[i] + ER12 * k12[i];
            e3 += sq(d3 / s);
            e5 += sq(d5 / s);
        }
        double den = e5 + 0.01 * e3;
        if (den <= 0.0) den = 1.0;
        double err = fabs(h) * e5 * sqrt(1.0 / (6.0 * den));
        if (!(err == err)) { st->fail = 1; return; }            /* NaN: give up */

        /* Controller (ibid., sec. II.4): h_new = h min(FAC2, max(FAC1, SAFE err^(-1/8))),
         * exponent 1/(q+1) with q = 7, the order of the error estimate taken as
         * the lower of the pair.  After a rejection the step may not grow. */
        double fac11 = pow(err, 1.0 / 8.0);
        double fac = fmax(1.0 / FAC2, fmin(1.0 / FAC1, fac11 / SAFE));
        double hnew = h / fac;
        if (err <= 1.0) {                                   /* accept */
            lorentz(kind, f, qm, yn, k1);                   /* FSAL: next step's stage 1 */
            st->nfev++;
            st->nacc++;
            memcpy(y, yn, sizeof yn);
            t = last ? tend : t + h;
            /* energy error, gamma - gamma0 = (u^2 - u0^2)/(c^2 (gamma + gamma0)) */
            double u2 = y[3] * y[3] + y[4] * y[4] + y[5] * y[5];
            double g = sqrt(1.0 + u2 * INV_C2);
            double dE = fabs((u2 - u2_0) * INV_C2 / (g + g0)) / (g0 - 1.0);
            if (dE > st->dEmax) st->dEmax = dE;
            if (last) return;
            if (fabs(hnew) > hmax) hnew = hmax;
            if (reject) hnew = fmin(hnew, h);
            reject = 0;
        } else {                                            /* reject */
            hnew = h / fmin(1.0 / FAC1, fac11 / SAFE);
            reject = 1;
            last = 0;
            st->nrej++;
        }
        h = hnew;
    }
}

/* One specialised copy per field, so that the field kind is folded in. */
typedef void integ_fn(const field *, double, double *, double, double, const double *, stats *);
#define WRAP(NAME, KIND) static NOINLINE void NAME(const field *f, double qm, double *y, \
    double tend, double rtol, const double *atol, stats *st) \
    { integrate(KIND, f, qm, y, tend, rtol, atol, st); }
WRAP(integ_dipole, DIPOLE)
WRAP(integ_mirror, MIRROR)
WRAP(integ_gradient, GRADIENT)
WRAP(integ_uniform, UNIFORM)
static integ_fn *const INTEG[] = {integ_dipole, integ_mirror, integ_gradient, integ_uniform};

/* ---------------------------------------------------------------- timing */

/* CPU time of this thread (not counting time-slicing by other processes on a
 * shared machine) and wall time. */
static double clock_s(clockid_t id)
{
    struct timespec ts;
    clock_gettime(id, &ts);
    return (double)ts.tv_sec + 1e-9 * (double)ts.tv_nsec;
}

/* ------------------------------------------------------------------ cases */

typedef struct {
    int kind, n, reps;
    double eps, ev, pitch, t, gyro, rtol;   /* eps or ev > 0; t (s) or gyro > 0 */
} spec;

typedef struct {
    double b0, ev, gamma, p, rho0, tc, tend;  /* T, eV, 1, kg m/s, m, s, s */
    stats st;
    double cpu, wall, x0[6], y0[6];           /* y0: phase 0 at tend */
} result;

static void basis(const double *b, double *e1, double *e2)
{
    /* GyroMaps.perpendicularBasis: e1 = part of x (y if |b_x| > 0.9) perpendicular
     * to b, normalised; e2 = b x e1. */
    double ax = 1.0, ay = 0.0;
    if (fabs(b[0]) > 0.9) { ax = 0.0; ay = 1.0; }
    double ab = ax * b[0] + ay * b[1];
    e1[0] = ax - ab * b[0];
    e1[1] = ay - ab * b[1];
    e1[2] = -ab * b[2];
    double n = sqrt(e1[0] * e1[0] + e1[1] * e1[1] + e1[2] * e1[2]);
    for (int i = 0; i < 3; i++) e1[i] /= n;
    e2[0] = b[1] * e1[2] - b[2] * e1[1];
    e2[1] = b[2] * e1[0] - b[0] * e1[2];
    e2[2] = b[0] * e1[1] - b[1] * e1[0];
}

static double bmag(const field *f, const double *x)
{
    double B[3];
    switch (f->kind) {   /* not the hot path: a switch is fine */
    case DIPOLE: bfield(DIPOLE, f, x[0], x[1], x[2], B); break;
    case MIRROR: bfield(MIRROR, f, x[0], x[1], x[2], B); break;
    case GRADIENT: bfield(GRADIENT, f, x[0], x[1], x[2], B); break;
    default: bfield(UNIFORM, f, x[0], x[1], x[2], B);
    }
    return sqrt(B[0] * B[0] + B[1] * B[1] + B[2] * B[2]);
}

/* Places the n particles (zeroth order, as GyroMaps.toParticle), integrates
 * each to the end time, reps times, timing the integrations only. */
static result run_case(const spec *s)
{
    result r;
    memset(&r, 0, sizeof r);
    field f = make_field(s->kind);
    const double m = M_P, q = Q_E, qm = q / m, *X = f.X;
    double B[3];
    switch (f.kind) {
    case DIPOLE: bfield(DIPOLE, &f, X[0], X[1], X[2], B); break;
    case MIRROR: bfield(MIRROR, &f, X[0], X[1], X[2], B); break;
    case GRADIENT: bfield(GRADIENT, &f, X[0], X[1], X[2], B); break;
    default: bfield(UNIFORM, &f, X[0], X[1], X[2], B);
    }
    r.b0 = sqrt(B[0] * B[0] + B[1] * B[1] + B[2] * B[2]);
    /* energy from eps: p = eps L |q| B, W = m u^2/(gamma + 1) (Relativity.kineticFromU) */
    if (s->eps > 0) {
        double u = s->eps * f.L * q * r.b0 / m, u2 = u * u;
        r.ev = m * u2 / (sqrt(1.0 + u2 / (C_LIGHT * C_LIGHT)) + 1.0) / Q_E;
    } else {
        r.ev = s->ev;
    }
    double kin = r.ev * Q_E / (m * C_LIGHT * C_LIGHT);       /* (gamma - 1) */
    r.gamma = 1.0 + kin;
    r.p = m * (C_LIGHT * sqrt(kin * (2.0 + kin)));           /* k (2 + k) keeps digits */
    r.rho0 = r.p / (q * r.b0);
    r.tc = 2.0 * PI / (q * r.b0 / (r.gamma * m));
    r.tend = s->t > 0 ? s->t : s->gyro * r.tc;
    double a = s->pitch * (PI / 180.0);
    double upar = r.p * cos(a) / m, pperp = r.p * sin(a);
    double mu = pperp * pperp / (2.0 * m * r.b0);
    double uperp = sqrt(2.0 * mu * r.b0 / m), kk = m / (q * r.b0);
    double b[3], e1[3], e2[3], inv = 1.0 / r.b0;
    for (int i = 0; i < 3; i++) b[i] = B[i] * inv;
    basis(b, e1, e2);

    double *ys = malloc(sizeof(double) * 6 * (size_t)s->n), atol[6];
    double c0 = clock_s(CLOCK_THREAD_CPUTIME_ID), w0 = clock_s(CLOCK_MONOTONIC);
    for (int rep = 0; rep < s->reps; rep++) {
        for (int k = 0; k < s->n; k++) {
            double th = 2.0 * PI * k / s->n, c = cos(th), sn = sin(th), w[3], *y = ys + 6 * k;
            for (int i = 0; i < 3; i++) w[i] = uperp * (c * e1[i] + sn * e2[i]);
            /* x = X + rho, rho = m (b x u)/(q |B(X)|); u = u_par b + u_perp */
            y[0] = X[0] + kk * (b[1] * w[2] - b[2] * w[1]);
            y[1] = X[1] + kk * (b[2] * w[0] - b[0] * w[2]);
            y[2] = X[2] + kk * (b[0] * w[1] - b[1] * w[0]);
            for (int i = 0; i < 3; i++) y[3 + i] = upar * b[i] + w[i];
            if (k == 0) memcpy(r.x0, y, sizeof r.x0);
            /* tolerances of FullOrbitReference: rtol rho on x, rtol |u0| on u, with
             * rho = m |u0| / (|q| |B(x0)|) taken at the particle's own start */
            double u0 = sqrt(y[3] * y[3] + y[4] * y[4] + y[5] * y[5]);
            double rho = m * u0 / (q * bmag(&f, y));
            for (int i = 0; i < 3; i++) { atol[i] = s->rtol * rho; atol[3 + i] = s->rtol * u0; }
            INTEG[s->kind](&f, qm, y, r.tend, s->rtol, atol, &r.st);
        }
    }
    r.cpu = clock_s(CLOCK_THREAD_CPUTIME_ID) - c0;
    r.wall = clock_s(CLOCK_MONOTONIC) - w0;
    memcpy(r.y0, ys, sizeof r.y0);
    /* a particle outside the field's domain (the Java run would stop it) fails */
    for (int k = 0; k < s->n; k++) {
        double *y = ys + 6 * k;
        if ((s->kind == DIPOLE && sqrt(y[0] * y[0] + y[1] * y[1] + y[2] * y[2]) <= 6.4e6)
            || (s->kind == MIRROR && fabs(y[2]) >= f.L) || (s->kind == GRADIENT && y[0] <= -f.lg))
            r.st.fail = 1;
    }
    free(ys);
    return r;
}

static void print_result(const spec *s, const result *r)
{
    long ev = r->st.nfev, steps = r->st.nacc + r->st.nrej;
    printf("case=%s W_eV=%.6g eps=%.6g rho0_m=%.6g T_c_s=%.6g pitch=%g phases=%d "
           "t_end_s=%.6g t_end_Tc=%.2f rtol=%g reps=%d\n", FIELD_NAMES[s->kind], r->ev,
           s->kind == UNIFORM ? 0.0 : r->rho0 / make_field(s->kind).L, r->rho0, r->tc,
           s->pitch, s->n, r->tend, r->tend / r->tc, s->rtol, s->reps);
    printf("accepted=%ld rejected=%ld fevals=%ld fevals_per_step=%.3f cpu_s=%.4f wall_s=%.4f "
           "ns_per_feval=%.3f wall_ns_per_feval=%.3f dE_max=%.3e%s\n", r->st.nacc, r->st.nrej,
           ev, (double)ev / (double)steps, r->cpu, r->wall, 1e9 * r->cpu / (double)ev,
           1e9 * r->wall / (double)ev, r->st.dEmax, r->st.fail ? " FAILED" : "");
    printf("phase0 start: x=(%.17g, %.17g, %.17g) m u=(%.17g, %.17g, %.17g) m/s\n",
           r->x0[0], r->x0[1], r->x0[2], r->x0[3], r->x0[4], r->x0[5]);
    printf("phase0 end:   x=(%.17g, %.17g, %.17g) m u=(%.17g, %.17g, %.17g) m/s\n",
           r->y0[0], r->y0[1], r->y0[2], r->y0[3], r->y0[4], r->y0[5]);
}

/* ------------------------------------------- the scan's reference runs */
/*
 * "orbits FILE": the full-orbit reference runs of a twinorbit scan, listed one per line by
 * org.twinorbit.harness.bench.ScanOrbits as "field rtol t_end interval x y z ux uy uz".  Each
 * is integrated as the Java reference does it: the step-size controller of Commons Math 3.6's
 * DormandPrince853Integrator (safety 0.9, step changes within [0.2, 10], the step after a
 * rejection not limited), the 7th-order dense output of DOP853 (Hairer, Norsett & Wanner 1993,
 * sec. II.10, from memory; three extra stages on a step that holds a sample) sampled every
 * interval from t = 0, at each sample the field evaluated and the gyro-averaged mu and v_par
 * accumulated by the trapezoidal rule, and the domain checked at every step end.  This is the
 * work of the Java reference and its observers, not more.
 */

/* dense output: the three extra stages, written relative to the new state (stage 1, 6..13) */
#define NB1 (104257.0 / 1920240.0)
#define NB6 (3399327.0 / 763840.0)
#define NB7 (66578432.0 / 35198415.0)
#define NB8 (-1674902723.0 / 288716400.0)
#define NB9 (54980371265625.0 / 176692375811392.0)
#define NB10 (-734375.0 / 4826304.0)
#define NB11 (171414593.0 / 851261400.0)
#define NB12 (137909.0 / 3084480.0)
static const double
D1401 = 13481885573.0 / 240030000000.0 - NB1, D1406 = 0.0 - NB6,
D1407 = 139418837528.0 / 549975234375.0 - NB7, D1408 = -11108320068443.0 / 45111937500000.0 - NB8,
D1409 = -1769651421925959.0 / 14249385146080000.0 - NB9, D1410 = 57799439.0 / 377055000.0 - NB10,
D1411 = 793322643029.0 / 96734250000000.0 - NB11, D1412 = 1458939311.0 / 192780000000.0 - NB12,
D1413 = -4149.0 / 500000.0,
D1501 = 1595561272731.0 / 50120273500000.0 - NB1, D1506 = 975183916491.0 / 34457688031250.0 - NB6,
D1507 = 38492013932672.0 / 718912673015625.0 - NB7,
D1508 = -1114881286517557.0 / 20298710767500000.0 - NB8, D1509 = 0.0 - NB9, D1510 = 0.0 - NB10,
D1511 = -2538710946863.0 / 23431227861250000.0 - NB11, D1512 = 8824659001.0 / 23066716781250.0 - NB12,
D1513 = -11518334563.0 / 33831184612500.0, D1514 = 1912306948.0 / 13532473845.0,
D1601 = -13613986967.0 / 31741908048.0 - NB1, D1606 = -4755612631.0 / 1012344804.0 - NB6,
D1607 = 42939257944576.0 / 5588559685701.0 - NB7, D1608 = 77881972900277.0 / 19140370552944.0 - NB8,
D1609 = 22719829234375.0 / 63689648654052.0 - NB9, D1610 = 0.0 - NB10, D1611 = 0.0 - NB11,
D1612 = 0.0 - NB12, D1613 = -1199007803.0 / 857031517296.0, D1614 = 157882067000.0 / 53564469831.0,
D1615 = -290468882375.0 / 31741908048.0;
/* weights of the 4th..7th polynomial coefficients on stages 1, 6..16 */
static const double PD[4][12] = {
    {-17751989329.0 / 2106076560.0, 4272954039.0 / 7539864640.0, -118476319744.0 / 38604839385.0,
     755123450731.0 / 316657731600.0, 3692384461234828125.0 / 1744130441634250432.0,
     -4612609375.0 / 5293382976.0, 2091772278379.0 / 933644586600.0, 2136624137.0 / 3382989120.0,
     -126493.0 / 1421424.0, 98350000.0 / 5419179.0, -18878125.0 / 2053168.0, -1944542619.0 / 438351368.0},
    {32941697297.0 / 3159114840.0, 456696183123.0 / 1884966160.0, 19132610714624.0 / 115814518155.0,
     -177904688592943.0 / 474986597400.0, -4821139941836765625.0 / 218016305204281304.0,
     30702015625.0 / 3970037232.0, -85916079474274.0 / 2800933759800.0, -5919468007.0 / 634310460.0,
     2479159.0 / 157936.0, -18750000.0 / 602131.0, -19203125.0 / 2053168.0, 15700361463.0 / 438351368.0},
    {12627015655.0 / 631822968.0, -72955222965.0 / 188496616.0, -13145744952320.0 / 69488710893.0,
     30084216194513.0 / 56998391688.0, -296858761006640625.0 / 25648977082856624.0,
     569140625.0 / 82709109.0, -18684190637.0 / 18672891732.0, 69644045.0 / 89549712.0,
     -11847025.0 / 4264272.0, -978650000.0 / 16257537.0, 519371875.0 / 6159504.0, 5256837225.0 / 438351368.0},
    {-450944925.0 / 17550638.0, -14532122925.0 / 94248308.0, -595876966400.0 / 2573655959.0,
     188748653015.0 / 527762886.0, 2545485458115234375.0 / 27252038150535163.0,
     -1376953125.0 / 36759604.0, 53995596795.0 / 518691437.0, 210311225.0 / 7047894.0,
     -1718875.0 / 39484.0, 58000000.0 / 602131.0, -1546875.0 / 39484.0, -1262172375.0 / 8429834.0}};

typedef struct {
    long samples;
    double mu_sum, vpar_sum;   /* trapezoidal time integrals over the run */
    double last_mu, last_vpar, last_t;
} observer;

/* what the Java observers do at a sample: the field there, mu = m u_perp^2/(2B) (per unit m
 * here), v_par, trapezoidal time integrals */
INLINE void observe(int kind, const field *f, double t, const double *y, observer *o)
{
    double B[3];
    bfield(kind, f, y[0], y[1], y[2], B);
    double b = sqrt(B[0] * B[0] + B[1] * B[1] + B[2] * B[2]), ib = 1.0 / b;
    double ux = y[3], uy = y[4], uz = y[5];
    double ig = 1.0 / sqrt(1.0 + (ux * ux + uy * uy + uz * uz) * INV_C2);
    double upar = (ux * B[0] + uy * B[1] + uz * B[2]) * ib;
    double uperp2 = ux * ux + uy * uy + uz * uz - upar * upar;
    double mu = 0.5 * uperp2 * ib, vpar = upar * ig;
    if (o->samples > 0) {
        double dt = t - o->last_t;
        o->mu_sum += 0.5 * dt * (mu + o->last_mu);
        o->vpar_sum += 0.5 * dt * (vpar + o->last_vpar);
    }
    o->samples++;
    o->last_mu = mu;
    o->last_vpar = vpar;
    o->last_t = t;
}

INLINE int outside(int kind, const field *f, const double *y)
{
    if (kind == DIPOLE) return sqrt(y[0] * y[0] + y[1] * y[1] + y[2] * y[2]) <= 6.4e6;
    if (kind == MIRROR) return fabs(y[2]) >= f->L;
    if (kind == GRADIENT) return y[0] <= -f->lg;
    return 0;
}

INLINE void sampled(int kind, const field *f, double qm, double *y, double tend, double rtol,
                    const double *atol, double interval, stats *st, observer *ob)
{
    double k1[6], k2[6], k3[6], k4[6], k5[6], k6[6], k7[6], k8[6], k9[6], k10[6], k11[6], k12[6],
           k13[6], k14[6], k15[6], k16[6], yt[6], yn[6], sk[6], v[7][6], ys[6];
    const double hmax = tend;
    lorentz(kind, f, qm, y, k1);
    st->nfev++;
    /* starting step (Hairer, Norsett & Wanner 1993, sec. II.4), as Commons Math writes it */
    double dnf = 0.0, dny = 0.0, der2 = 0.0, h;
    for (int i = 0; i < 6; i++) {
        sk[i] = atol[i] + rtol * fabs(y[i]);
        dny += sq(y[i] / sk[i]);
        dnf += sq(k1[i] / sk[i]);
    }
    h = (dny < 1e-10 || dnf < 1e-10) ? 1e-6 : 0.01 * sqrt(dny / dnf);
    for (int i = 0; i < 6; i++) yt[i] = y[i] + h * k1[i];
    lorentz(kind, f, qm, yt, k2);
    st->nfev++;
    for (int i = 0; i < 6; i++) der2 += sq((k2[i] - k1[i]) / sk[i]);
    der2 = sqrt(der2) / h;
    double der12 = fmax(sqrt(dnf), der2);
    double h1 = der12 < 1e-15 ? fmax(1e-6, 0.001 * fabs(h)) : pow(0.01 / der12, 1.0 / 8.0);
    h = fmin(fmin(100.0 * fabs(h), h1), hmax);

    double t = 0.0, next = interval, last_sample = 0.0;
    observe(kind, f, 0.0, y, ob);
    for (;;) {
        double err;
        for (;;) {
            if (t + h >= tend) h = tend - t;
#define STAGE(K, C, SUM) do { for (int i = 0; i < 6; i++) yt[i] = y[i] + h * (SUM); \
                              lorentz(kind, f, qm, yt, K); } while (0)
            STAGE(k2, , A21 * k1[i]);
            STAGE(k3, , A31 * k1[i] + A32 * k2[i]);
            STAGE(k4, , A41 * k1[i] + A43 * k3[i]);
            STAGE(k5, , A51 * k1[i] + A53 * k3[i] + A54 * k4[i]);
            STAGE(k6, , A61 * k1[i] + A64 * k4[i] + A65 * k5[i]);
            STAGE(k7, , A71 * k1[i] + A74 * k4[i] + A75 * k5[i] + A76 * k6[i]);
            STAGE(k8, , A81 * k1[i] + A84 * k4[i] + A85 * k5[i] + A86 * k6[i] + A87 * k7[i]);
            STAGE(k9, , A91 * k1[i] + A94 * k4[i] + A95 * k5[i] + A96 * k6[i] + A97 * k7[i]
                      + A98 * k8[i]);
            STAGE(k10, , A101 * k1[i] + A104 * k4[i] + A105 * k5[i] + A106 * k6[i] + A107 * k7[i]
                       + A108 * k8[i] + A109 * k9[i]);
            STAGE(k11, , A111 * k1[i] + A114 * k4[i] + A115 * k5[i] + A116 * k6[i] + A117 * k7[i]
                       + A118 * k8[i] + A119 * k9[i] + A1110 * k10[i]);
            STAGE(k12, , A121 * k1[i] + A124 * k4[i] + A125 * k5[i] + A126 * k6[i] + A127 * k7[i]
                       + A128 * k8[i] + A129 * k9[i] + A1210 * k10[i] + A1211 * k11[i]);
            double e5 = 0.0, e3 = 0.0;
            for (int i = 0; i < 6; i++) {
                double kb = B1 * k1[i] + B6 * k6[i] + B7 * k7[i] + B8 * k8[i] + B9 * k9[i]
                            + B10 * k10[i] + B11 * k11[i] + B12 * k12[i];
                yn[i] = y[i] + h * kb;
            }
            lorentz(kind, f, qm, yn, k13);            /* stage 13 = f(yn), as Commons Math */
            st->nfev += 12;
            for (int i = 0; i < 6; i++) {
                double kb = B1 * k1[i] + B6 * k6[i] + B7 * k7[i] + B8 * k8[i] + B9 * k9[i]
                            + B10 * k10[i] + B11 * k11[i] + B12 * k12[i];
                double s = atol[i] + rtol * fmax(fabs(y[i]), fabs(yn[i]));
                double d3 = kb - BHH1 * k1[i] - BHH2 * k9[i] - BHH3 * k12[i];
                double d5 = ER1 * k1[i] + ER6 * k6[i] + ER7 * k7[i] + ER8 * k8[i] + ER9 * k9[i]
                            + ER10 * k10[i] + ER11 * k11[i] + ER12 * k12[i];
                e3 += sq(d3 / s);
                e5 += sq(d5 / s);
            }
            double den = e5 + 0.01 * e3;
            if (den <= 0.0) den = 1.0;
            err = fabs(h) * e5 / sqrt(6.0 * den);
            if (!(err == err)) { st->fail = 1; return; }
            if (err < 1.0) break;
            st->nrej++;
            h = fmin(h * fmin(10.0, fmax(0.2, 0.9 * pow(err, -1.0 / 8.0))), hmax);
        }
        st->nacc++;
        double t1 = t + h;
        /* samples inside (t, t1]: the dense output, prepared once per step */
        int ready = 0;
        while (next <= t1) {
            if (next == t1) {
                memcpy(ys, yn, sizeof ys);
            } else {
                if (!ready) {
                    for (int i = 0; i < 6; i++) yt[i] = yn[i] + h * (D1401 * k1[i] + D1406 * k6[i]
                        + D1407 * k7[i] + D1408 * k8[i] + D1409 * k9[i] + D1410 * k10[i]
                        + D1411 * k11[i] + D1412 * k12[i] + D1413 * k13[i]);
                    lorentz(kind, f, qm, yt, k14);
                    for (int i = 0; i < 6; i++) yt[i] = yn[i] + h * (D1501 * k1[i] + D1506 * k6[i]
                        + D1507 * k7[i] + D1508 * k8[i] + D1509 * k9[i] + D1510 * k10[i]
                        + D1511 * k11[i] + D1512 * k12[i] + D1513 * k13[i] + D1514 * k14[i]);
                    lorentz(kind, f, qm, yt, k15);
                    for (int i = 0; i < 6; i++) yt[i] = yn[i] + h * (D1601 * k1[i] + D1606 * k6[i]
                        + D1607 * k7[i] + D1608 * k8[i] + D1609 * k9[i] + D1610 * k10[i]
                        + D1611 * k11[i] + D1612 * k12[i] + D1613 * k13[i] + D1614 * k14[i]
                        + D1615 * k15[i]);
                    lorentz(kind, f, qm, yt, k16);
                    st->nfev += 3;
                    for (int i = 0; i < 6; i++) {
                        double b = B1 * k1[i] + B6 * k6[i] + B7 * k7[i] + B8 * k8[i] + B9 * k9[i]
                                   + B10 * k10[i] + B11 * k11[i] + B12 * k12[i];
                        v[0][i] = b;
                        v[1][i] = k1[i] - b;
                        v[2][i] = b - v[1][i] - k13[i];
                        for (int m = 0; m < 4; m++) {
                            const double *p = PD[m];
                            v[m + 3][i] = p[0] * k1[i] + p[1] * k6[i] + p[2] * k7[i] + p[3] * k8[i]
                                + p[4] * k9[i] + p[5] * k10[i] + p[6] * k11[i] + p[7] * k12[i]
                                + p[8] * k13[i] + p[9] * k14[i] + p[10] * k15[i] + p[11] * k16[i];
                        }
                    }
                    ready = 1;
                }
                double omh = t1 - next, th = (h - omh) / h, eta = 1.0 - th;
                for (int i = 0; i < 6; i++) {
                    double p = v[4][i] + eta * (v[5][i] + th * v[6][i]);
                    if (th <= 0.5)
                        ys[i] = y[i] + th * h * (v[0][i] + eta * (v[1][i] + th * (v[2][i]
                                + eta * (v[3][i] + th * p))));
                    else
                        ys[i] = yn[i] - omh * (v[0][i] - th * (v[1][i] + th * (v[2][i]
                                + eta * (v[3][i] + th * p))));
                }
            }
            observe(kind, f, next, ys, ob);
            last_sample = next;
            next = last_sample + interval;
        }
        memcpy(y, yn, sizeof yn);
        memcpy(k1, k13, sizeof k13);
        t = t1;
        if (outside(kind, f, y)) { st->fail = 1; return; }
        if (fabs(t - tend) <= 2.3e-16 * fabs(tend)) {          /* the end, to about one ulp */
            if (last_sample != t) observe(kind, f, t, y, ob);
            return;
        }
        double hn = fmin(h * fmin(10.0, fmax(0.2, 0.9 * pow(err, -1.0 / 8.0))), hmax);
        h = t + hn >= tend ? tend - t : hn;
    }
}

typedef void sampled_fn(const field *, double, double *, double, double, const double *, double,
                        stats *, observer *);
#define WRAPS(NAME, KIND) static NOINLINE void NAME(const field *f, double qm, double *y, \
    double tend, double rtol, const double *atol, double interval, stats *st, observer *o) \
    { sampled(KIND, f, qm, y, tend, rtol, atol, interval, st, o); }
WRAPS(sampled_dipole, DIPOLE)
WRAPS(sampled_mirror, MIRROR)
WRAPS(sampled_gradient, GRADIENT)
WRAPS(sampled_uniform, UNIFORM)
static sampled_fn *const SAMPLED[] = {sampled_dipole, sampled_mirror, sampled_gradient, sampled_uniform};

static int run_orbits(const char *path)
{
    FILE *in = fopen(path, "r");
    if (!in) { fprintf(stderr, "cannot read %s\n", path); return 2; }
    enum { MAXO = 100000 };
    static int kinds[MAXO];
    static double rows[MAXO][9];
    int n = 0;
    char name[64];
    while (n < MAXO && fscanf(in, "%63s %lf %lf %lf %lf %lf %lf %lf %lf %lf", name, &rows[n][0],
                              &rows[n][1], &rows[n][2], &rows[n][3], &rows[n][4], &rows[n][5],
                              &rows[n][6], &rows[n][7], &rows[n][8]) == 10) {
        int k;
        for (k = 0; k < 4 && strcmp(name, FIELD_NAMES[k]); k++) {}
        if (k == 4) { fprintf(stderr, "field '%s' unknown here\n", name); return 2; }
        kinds[n++] = k;
    }
    fclose(in);
    field fs[4];
    for (int k = 0; k < 4; k++) fs[k] = make_field(k);
    const double m = M_P, q = Q_E, qm = q / m;
    stats st;
    memset(&st, 0, sizeof st);
    observer total;
    memset(&total, 0, sizeof total);
    double check = 0.0;
    double c0 = clock_s(CLOCK_THREAD_CPUTIME_ID), w0 = clock_s(CLOCK_MONOTONIC);
    for (int r = 0; r < n; r++) {
        double *row = rows[r], y[6], atol[6];
        memcpy(y, row + 3, sizeof y);
        /* tolerances of FullOrbitReference: rtol rho0 on x, rtol |u0| on u */
        double u0 = sqrt(y[3] * y[3] + y[4] * y[4] + y[5] * y[5]);
        double rho = m * u0 / (q * bmag(&fs[kinds[r]], y));
        for (int i = 0; i < 3; i++) { atol[i] = row[0] * rho; atol[3 + i] = row[0] * u0; }
        observer ob;
        memset(&ob, 0, sizeof ob);
        int fail0 = st.fail;
        st.fail = 0;
        SAMPLED[kinds[r]](&fs[kinds[r]], qm, y, row[1], row[0], atol, row[2], &st, &ob);
        st.fail |= fail0;
        total.samples += ob.samples;
        check += ob.mu_sum / row[1];
    }
    double cpu = clock_s(CLOCK_THREAD_CPUTIME_ID) - c0, wall = clock_s(CLOCK_MONOTONIC) - w0;
    printf("orbits=%d accepted=%ld rejected=%ld fevals=%ld samples=%ld cpu_s=%.4f wall_s=%.4f "
           "ns_per_feval=%.3f mean_mu_check=%.6e%s\n", n, st.nacc, st.nrej, st.nfev, total.samples,
           cpu, wall, 1e9 * cpu / (double)st.nfev, check / n, st.fail ? " (some left the domain)" : "");
    return 0;
}

/* ----------------------------------------------------------------- checks */

static int nfail = 0;

static void verdict(const char *what, int ok)
{
    printf("  [%s] %s\n", ok ? "PASS" : "FAIL", what);
    if (!ok) nfail++;
}

static spec default_spec(int kind)
{
    spec s = {kind, 8, 1, 0.0309, 0.0, 30.0, kind == DIPOLE ? 43.28 : 0.0, 100.0, 1e-10};
    if (kind == UNIFORM) { s.eps = 0.0; s.ev = 1e4; }
    return s;
}

static int check(void)
{
    /* 1. energy: the default dipole run at rtol 1e-10 */
    spec s = default_spec(DIPOLE);
    result a = run_case(&s);
    print_result(&s, &a);
    /* A non-symplectic Runge-Kutta method drifts in energy by roughly rtol per step at most;
     * the default run takes ~1.1e4 steps per particle at rtol 1e-10, so 1e-7 bounds it with a
     * margin and still catches a wrong tableau (which drifts by orders of magnitude more). */
    verdict("dipole default run: max |dE/E| < 1e-7, all particles inside the domain",
            a.st.dEmax < 1e-7 && !a.st.fail);

    /* 2. convergence: phase 0 again at rtol 1e-12 */
    s.n = 1;
    s.rtol = 1e-12;
    result b = run_case(&s);
    print_result(&s, &b);
    double dx = sqrt(sq(a.y0[0] - b.y0[0]) + sq(a.y0[1] - b.y0[1]) + sq(a.y0[2] - b.y0[2]));
    printf("  phase 0 final position, rtol 1e-10 vs 1e-12: |dx| = %.3e m = %.3e rho0\n",
           dx, dx / a.rho0);
    verdict("rtol 1e-10 and 1e-12 agree on phase 0's final position to < 1e-4 rho0",
            dx < 1e-4 * a.rho0 && !b.st.fail);

    /* 3. uniform B = 1 T along z: the exact orbit, u_perp turning by -Omega t
     * (Omega = qB/(gamma m), a proton turns clockwise about +z),
     * x = X + m (z x u)/(qB) + (u_par/gamma) t z */
    s = default_spec(UNIFORM);
    s.n = 1;
    result c = run_case(&s);
    print_result(&s, &c);
    double ph = -(Q_E * 1.0 / (c.gamma * M_P)) * c.tend, cs = cos(ph), sn = sin(ph);
    double ux = cs * c.x0[3] - sn * c.x0[4], uy = sn * c.x0[3] + cs * c.x0[4];
    double k = M_P / (Q_E * 1.0);
    double xe[3] = {-k * uy, k * ux, c.x0[5] / c.gamma * c.tend};
    double ex = sqrt(sq(c.y0[0] - xe[0]) + sq(c.y0[1] - xe[1]) + sq(c.y0[2] - xe[2]));
    printf("  uniform B, %.0f gyroperiods: |x - x_exact| = %.3e m = %.3e rho0\n",
           c.tend / c.tc, ex, ex / c.rho0);
    verdict("uniform B: final position matches the exact circular orbit to < 1e-7 rho0",
            ex < 1e-7 * c.rho0 && !c.st.fail);

    /* 4. the other two fields run and conserve energy (100 initial gyroperiods) */
    int kinds[2] = {MIRROR, GRADIENT};
    double pitch[2] = {60.0, 90.0};
    for (int i = 0; i < 2; i++) {
        s = default_spec(kinds[i]);
        s.eps = 0.05;
        s.pitch = pitch[i];
        result d = run_case(&s);
        print_result(&s, &d);
        char what[128];
        snprintf(what, sizeof what, "%s eps 0.05, pitch %.0f: max |dE/E| < 1e-8, inside the domain",
                 FIELD_NAMES[kinds[i]], pitch[i]);
        verdict(what, d.st.dEmax < 1e-8 && !d.st.fail);
    }
    printf("%s: %d check(s) failed\n", nfail ? "FAIL" : "OK", nfail);
    return nfail ? 1 : 0;
}

/* ------------------------------------------------------------------- main */

int main(int argc, char **argv)
{
    if (argc > 1 && !strcmp(argv[1], "check")) return check();
    if (argc > 2 && !strcmp(argv[1], "orbits")) return run_orbits(argv[2]);
    int kind = DIPOLE, first = 1;
    if (argc > 1 && strchr(argv[1], '=') == NULL) {
        first = 2;
        for (kind = 0; kind < 4 && strcmp(argv[1], FIELD_NAMES[kind]); kind++) {}
        if (!strcmp(argv[1], "caseB")) kind = DIPOLE;
        else if (kind == 4) {
            fprintf(stderr, "usage: %s [dipole|mirror|gradient|uniform|caseB|check] [eps=E|ev=W] "
                    "[pitch=DEG] [n=N] [t=S|gyro=P] [rtol=R] [reps=K]\n", argv[0]);
            return 2;
        }
    }
    spec s = default_spec(kind);
    if (argc > 1 && !strcmp(argv[1], "caseB")) { s.eps = 0.0124; s.t = 107.8; }
    for (int i = first; i < argc; i++) {
        const char *eq = strchr(argv[i], '=');
        double v = eq ? atof(eq + 1) : 0.0;
        size_t n = eq ? (size_t)(eq - argv[i]) : 0;
        if (n == 3 && !strncmp(argv[i], "eps", 3)) { s.eps = v; s.ev = 0; }
        else if (n == 2 && !strncmp(argv[i], "ev", 2)) { s.ev = v; s.eps = 0; }
        else if (n == 5 && !strncmp(argv[i], "pitch", 5)) s.pitch = v;
        else if (n == 1 && argv[i][0] == 'n') s.n = (int)v;
        else if (n == 1 && argv[i][0] == 't') { s.t = v; s.gyro = 0; }
        else if (n == 4 && !strncmp(argv[i], "gyro", 4)) { s.gyro = v; s.t = 0; }
        else if (n == 4 && !strncmp(argv[i], "rtol", 4)) s.rtol = v;
        else if (n == 4 && !strncmp(argv[i], "reps", 4)) s.reps = (int)v;
        else { fprintf(stderr, "unknown argument '%s'\n", argv[i]); return 2; }
    }
    if ((s.eps <= 0 && s.ev <= 0) || (s.kind == UNIFORM && s.eps > 0) || s.n < 1 || s.reps < 1
        || (s.t <= 0 && s.gyro <= 0) || !(s.rtol > 0)) {
        fprintf(stderr, "bad case: give eps (not for uniform) or ev > 0, n >= 1, t or gyro > 0, rtol > 0\n");
        return 2;
    }
    result r = run_case(&s);
    print_result(&s, &r);
    return r.st.fail ? 1 : 0;
}
