/*
 * boris_gradient.c -- an outside pusher for twinorbit, in plain C.
 *
 * Reads a case written by `twinorbit export` (case.csv, runs.csv, initial-states.csv), pushes
 * every run it asks for with the relativistic Boris scheme (J. P. Boris, 1970) in the field
 * `gradient`, B = B0 (1 + x/Lg) z, and writes the trajectory files back in the documented
 * layout (phase,t_s,x_m,y_m,z_m,ux_m_per_s,uy_m_per_s,uz_m_per_s; u = gamma v at the time of x).
 * `twinorbit score` then rates them like a built-in pusher.
 *
 * The staggering follows the leapfrog convention twinorbit documents for its own Boris: u is
 * kept at half steps; the start moves u0 back by half a rotation, and the velocity written
 * with each position is the staggered u moved forward by half a rotation in the local B.
 *
 * Build: cc -O2 -ffp-contract=off -o boris_gradient boris_gradient.c -lm
 * Use:   ./boris_gradient DIR        (DIR: the case directory of the export)
 */
#include <math.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>

static const double C_LIGHT = 299792458.0;
static double mass, charge, b0 = NAN, lg = NAN;

/* B_z (T) of the gradient field at x (m); B_x = B_y = 0. */
static double field_bz(double x) { return b0 * (1.0 + x / lg); }

/* The Boris rotation of u about t with factor f = 2/(1 + |t|^2). */
static void rotate(double u[3], double tx, double ty, double tz, double f) {
    double sx = f * tx, sy = f * ty, sz = f * tz;
    double px = u[0] + (u[1] * tz - u[2] * ty);
    double py = u[1] + (u[2] * tx - u[0] * tz);
    double pz = u[2] + (u[0] * ty - u[1] * tx);
    u[0] += py * sz - pz * sy;
    u[1] += pz * sx - px * sz;
    u[2] += px * sy - py * sx;
}

/* Half of the rotation by t (tan of the quarter angle), forward (sign +1) or back (-1). */
static void rotate_half(double u[3], double tx, double ty, double tz, int sign) {
    double k = sign / (1.0 + sqrt(1.0 + tx * tx + ty * ty + tz * tz));
    double ax = k * tx, ay = k * ty, az = k * tz;
    rotate(u, ax, ay, az, 2.0 / (1.0 + ax * ax + ay * ay + az * az));
}

/* Moves u by half a step in the field at x (no E): rotation at the gamma of u. */
static void half_step(double u[3], double x, double h, int sign) {
    double tz = h * field_bz(x);
    double ig = 1.0 / sqrt(1.0 + (u[0] * u[0] + u[1] * u[1] + u[2] * u[2]) / (C_LIGHT * C_LIGHT));
    rotate_half(u, ig * 0.0, ig * 0.0, ig * tz, sign);
}

static FILE *open_or_die(const char *dir, const char *name, const char *mode) {
    char path[4096];
    snprintf(path, sizeof path, "%s/%s", dir, name);
    FILE *f = fopen(path, mode);
    if (!f) {
        fprintf(stderr, "boris_gradient: cannot open %s\n", path);
        exit(2);
    }
    return f;
}

int main(int argc, char **argv) {
    if (argc != 2) {
        fprintf(stderr, "usage: boris_gradient DIR (a case directory written by twinorbit export)\n");
        return 2;
    }
    const char *dir = argv[1];
    char line[4096], key[256], value[256];

    FILE *cf = open_or_die(dir, "case.csv", "r");
    fgets(line, sizeof line, cf); /* header */
    while (fgets(line, sizeof line, cf)) {
        if (sscanf(line, "%255[^,],%255[^,\n]", key, value) != 2) continue;
        if (!strcmp(key, "field") && strcmp(value, "gradient")) {
            fprintf(stderr, "boris_gradient: this example implements the field 'gradient', not '%s'\n", value);
            return 2;
        }
        if (!strcmp(key, "mass")) mass = atof(value);
        if (!strcmp(key, "charge")) charge = atof(value);
        if (!strcmp(key, "field.B0")) b0 = atof(value);
        if (!strcmp(key, "field.Lg")) lg = atof(value);
    }
    fclose(cf);

    static double x0[1024][3], u0[1024][3];
    int nph = 0;
    FILE *inf = open_or_die(dir, "initial-states.csv", "r");
    fgets(line, sizeof line, inf);
    while (nph < 1024 && fgets(line, sizeof line, inf)) {
        int k;
        if (sscanf(line, "%d,%lf,%lf,%lf,%lf,%lf,%lf", &k, &x0[nph][0], &x0[nph][1], &x0[nph][2], &u0[nph][0],
                   &u0[nph][1], &u0[nph][2]) == 7) nph++;
    }
    fclose(inf);

    FILE *rf = open_or_die(dir, "runs.csv", "r");
    fgets(line, sizeof line, rf);
    while (fgets(line, sizeof line, rf)) {
        char purpose[64], phases[4096], file[1024];
        int level;
        double dt;
        long steps;
        if (sscanf(line, "%63[^,],%d,%lf,%ld,%4095[^,],%1023[^,\n]", purpose, &level, &dt, &steps, phases, file) != 6)
            continue;
        double h = charge * dt / (2.0 * mass);
        FILE *out = open_or_die(dir, file, "w");
        fprintf(out, "phase,t_s,x_m,y_m,z_m,ux_m_per_s,uy_m_per_s,uz_m_per_s\n");
        char *save = NULL;
        for (char *tok = strtok_r(phases, " ", &save); tok; tok = strtok_r(NULL, " ", &save)) {
            int k = atoi(tok);
            double x[3] = {x0[k][0], x0[k][1], x0[k][2]};
            double u[3] = {u0[k][0], u0[k][1], u0[k][2]};
            half_step(u, x[0], h, -1); /* u at -dt/2 */
            for (long i = 0; i <= steps; i++) {
                if (i > 0) {
                    /* rotation at the gamma of u (|u| is kept), then the drift */
                    double bz = field_bz(x[0]);
                    double g2 = 1.0 + (u[0] * u[0] + u[1] * u[1] + u[2] * u[2]) / (C_LIGHT * C_LIGHT);
                    double ig = 1.0 / sqrt(g2);
                    double kk = h * ig;
                    rotate(u, kk * 0.0, kk * 0.0, kk * bz, 2.0 * g2 / (g2 + h * h * (bz * bz)));
                    double g = ig * dt;
                    x[0] += u[0] * g;
                    x[1] += u[1] * g;
                    x[2] += u[2] * g;
                    if (!(x[0] > -lg)) break; /* left the domain: the file ends here */
                }
                double us[3] = {u[0], u[1], u[2]};
                half_step(us, x[0], h, +1); /* u at the time of x */
                fprintf(out, "%d,%.17g,%.17g,%.17g,%.17g,%.17g,%.17g,%.17g\n", k, i * dt, x[0], x[1], x[2], us[0],
                        us[1], us[2]);
            }
        }
        fclose(out);
    }
    fclose(rf);
    return 0;
}
