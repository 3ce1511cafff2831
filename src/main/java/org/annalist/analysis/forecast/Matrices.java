package org.annalist.analysis.forecast;

/** The few dense-matrix operations the forecast-variance recursions and the records' copies need, on row-major arrays. */
final class Matrices {

    private Matrices() {
    }

    static double[][] product(double[][] a, double[][] b) {
        int rows = a.length;
        int inner = b.length;
        int cols = b[0].length;
        double[][] c = new double[rows][cols];
        for (int i = 0; i < rows; i++) {
            for (int t = 0; t < inner; t++) {
                double ait = a[i][t];
                if (ait == 0) {
                    continue; // the transition matrices are mostly zeros
                }
                for (int j = 0; j < cols; j++) {
                    c[i][j] += ait * b[t][j];
                }
            }
        }
        return c;
    }

    static double[][] product(double[][] a, double[][] b, double[][] c) {
        return product(product(a, b), c);
    }

    static double[][] transpose(double[][] a) {
        double[][] t = new double[a[0].length][a.length];
        for (int i = 0; i < a.length; i++) {
            for (int j = 0; j < a[0].length; j++) {
                t[j][i] = a[i][j];
            }
        }
        return t;
    }

    static double[][] add(double[][] a, double[][] b) {
        double[][] c = new double[a.length][a[0].length];
        for (int i = 0; i < a.length; i++) {
            for (int j = 0; j < a[0].length; j++) {
                c[i][j] = a[i][j] + b[i][j];
            }
        }
        return c;
    }

    static double[][] scale(double factor, double[][] a) {
        double[][] c = new double[a.length][a[0].length];
        for (int i = 0; i < a.length; i++) {
            for (int j = 0; j < a[0].length; j++) {
                c[i][j] = factor * a[i][j];
            }
        }
        return c;
    }

    /** A ⊗ B, so that (A ⊗ B) vec(M) = vec(B M Aᵀ). */
    static double[][] kronecker(double[][] a, double[][] b) {
        int br = b.length;
        int bc = b[0].length;
        double[][] k = new double[a.length * br][a[0].length * bc];
        for (int i = 0; i < a.length; i++) {
            for (int j = 0; j < a[0].length; j++) {
                for (int r = 0; r < br; r++) {
                    for (int c = 0; c < bc; c++) {
                        k[i * br + r][j * bc + c] = a[i][j] * b[r][c];
                    }
                }
            }
        }
        return k;
    }

    /** A deep copy: every row copied (rows may differ in length). */
    static double[][] copy(double[][] a) {
        double[][] c = new double[a.length][];
        for (int i = 0; i < a.length; i++) {
            c[i] = a[i].clone();
        }
        return c;
    }

    /** The columns of M stacked into one column vector. */
    static double[][] vec(double[][] m) {
        double[][] v = new double[m.length * m[0].length][1];
        for (int j = 0; j < m[0].length; j++) {
            for (int i = 0; i < m.length; i++) {
                v[j * m.length + i][0] = m[i][j];
            }
        }
        return v;
    }
}
