package org.littoral.model.nonlinear;

/**
 * In-place-style complex discrete Fourier transform of any length, by the mixed-radix Stockham
 * autosort algorithm (Cooley &amp; Tukey 1965 factorisation; self-sorting form of Stockham as given in
 * Van Loan 1992, Computational Frameworks for the Fast Fourier Transform, sec. 1.7). Radix-2, 3, 4 and
 * 5 passes are written out; any other prime factor uses a direct DFT pass (slow for large primes, so
 * choose nx with small factors, e.g. 400 = 4 * 4 * 5 * 5 or 512).
 *
 * <p>Forward: X[f] = sum_t x[t] exp(-2 pi i f t / n). Inverse is unnormalised (caller divides by n).
 * Not thread-safe: each instance owns its work buffers (allocated once in the constructor).
 */
final class ComplexFft {
    private final int n;
    private final int[] factors;
    private final double[][] twRe;
    private final double[][] twIm;
    private final double[] workRe;
    private final double[] workIm;
    private final double[] scratchRe;
    private final double[] scratchIm;

    ComplexFft(int n) {
        if (n < 1) {
            throw new IllegalArgumentException("FFT length must be positive; got " + n);
        }
        this.n = n;
        this.factors = factorise(n);
        this.twRe = new double[factors.length][];
        this.twIm = new double[factors.length][];
        int lPrev = 1;
        for (int s = 0; s < factors.length; s++) {
            int p = factors[s];
            int l = lPrev * p;
            double[] re = new double[lPrev * p];
            double[] im = new double[lPrev * p];
            for (int j = 0; j < lPrev; j++) {
                for (int v = 0; v < p; v++) {
                    double a = -2.0 * Math.PI * j * v / l;
                    re[j * p + v] = Math.cos(a);
                    im[j * p + v] = Math.sin(a);
                }
            }
            twRe[s] = re;
            twIm[s] = im;
            lPrev = l;
        }
        workRe = new double[n];
        workIm = new double[n];
        int maxP = 1;
        for (int p : factors) {
            maxP = Math.max(maxP, p);
        }
        scratchRe = new double[2 * maxP];
        scratchIm = new double[2 * maxP];
    }

    int length() {
        return n;
    }

    static int[] factorise(int n) {
        int[] tmp = new int[32];
        int c = 0;
        int m = n;
        while (m % 4 == 0) {
            tmp[c++] = 4;
            m /= 4;
        }
        while (m % 2 == 0) {
            tmp[c++] = 2;
            m /= 2;
        }
        for (int p = 3; m > 1; p += 2) {
            while (m % p == 0) {
                tmp[c++] = p;
                m /= p;
            }
            if (p * p > m && m > 1) {
                tmp[c++] = m;
                m = 1;
            }
        }
        int[] f = new int[c];
        System.arraycopy(tmp, 0, f, 0, c);
        return f;
    }

    /** Forward transform of (re, im), overwritten with the result. */
    void forward(double[] re, double[] im) {
        transform(re, im, false);
    }

    /** Unnormalised inverse transform of (re, im), overwritten. */
    void inverse(double[] re, double[] im) {
        transform(re, im, true);
    }

    private void transform(double[] re, double[] im, boolean inverse) {
        if (n == 1) {
            return;
        }
        if (inverse) {
            for (int t = 0; t < n; t++) {
                im[t] = -im[t];
            }
        }
        double[] aRe = re;
        double[] aIm = im;
        double[] bRe = workRe;
        double[] bIm = workIm;
        int lPrev = 1;
        int r = n;
        for (int s = 0; s < factors.length; s++) {
            int p = factors[s];
            r /= p;
            int l = lPrev * p;
            pass(p, lPrev, l, r, twRe[s], twIm[s], aRe, aIm, bRe, bIm);
            double[] t1 = aRe;
            aRe = bRe;
            bRe = t1;
            double[] t2 = aIm;
            aIm = bIm;
            bIm = t2;
            lPrev = l;
        }
        if (aRe != re) {
            System.arraycopy(aRe, 0, re, 0, n);
            System.arraycopy(aIm, 0, im, 0, n);
        }
        if (inverse) {
            for (int t = 0; t < n; t++) {
                im[t] = -im[t];
            }
        }
    }

    /**
     * One Stockham stage: A_s[q][j' + c L'] = sum_v w_p^(c v) (w_L^(j' v) A_{s-1}[q + v r][j']),
     * with A_s stored as A_s[q * L + j] (q &lt; r = n / L).
     */
    private void pass(int p, int lPrev, int l, int r, double[] tr, double[] ti,
                             double[] aRe, double[] aIm, double[] bRe, double[] bIm) {
        switch (p) {
            case 2 -> {
                for (int q = 0; q < r; q++) {
                    int in0 = q * lPrev;
                    int in1 = (q + r) * lPrev;
                    int out = q * l;
                    for (int j = 0; j < lPrev; j++) {
                        double x0r = aRe[in0 + j];
                        double x0i = aIm[in0 + j];
                        double wr = tr[j * 2 + 1];
                        double wi = ti[j * 2 + 1];
                        double yr = aRe[in1 + j];
                        double yi = aIm[in1 + j];
                        double x1r = yr * wr - yi * wi;
                        double x1i = yr * wi + yi * wr;
                        bRe[out + j] = x0r + x1r;
                        bIm[out + j] = x0i + x1i;
                        bRe[out + j + lPrev] = x0r - x1r;
                        bIm[out + j + lPrev] = x0i - x1i;
                    }
                }
            }
            case 4 -> {
                if (lPrev == 1) {
                    // first pass: every twiddle factor is 1, so the butterflies need no multiplications
                    for (int q = 0; q < r; q++) {
                        int out = q * 4;
                        double x0r = aRe[q];
                        double x0i = aIm[q];
                        double x1r = aRe[q + r];
                        double x1i = aIm[q + r];
                        double x2r = aRe[q + 2 * r];
                        double x2i = aIm[q + 2 * r];
                        double x3r = aRe[q + 3 * r];
                        double x3i = aIm[q + 3 * r];
                        double s02r = x0r + x2r;
                        double s02i = x0i + x2i;
                        double d02r = x0r - x2r;
                        double d02i = x0i - x2i;
                        double s13r = x1r + x3r;
                        double s13i = x1i + x3i;
                        double d13r = x1r - x3r;
                        double d13i = x1i - x3i;
                        bRe[out] = s02r + s13r;
                        bIm[out] = s02i + s13i;
                        bRe[out + 1] = d02r + d13i;
                        bIm[out + 1] = d02i - d13r;
                        bRe[out + 2] = s02r - s13r;
                        bIm[out + 2] = s02i - s13i;
                        bRe[out + 3] = d02r - d13i;
                        bIm[out + 3] = d02i + d13r;
                    }
                    return;
                }
                for (int q = 0; q < r; q++) {
                    int out = q * l;
                    for (int j = 0; j < lPrev; j++) {
                        int tw = j * 4;
                        double x0r = aRe[q * lPrev + j];
                        double x0i = aIm[q * lPrev + j];
                        double yr = aRe[(q + r) * lPrev + j];
                        double yi = aIm[(q + r) * lPrev + j];
                        double x1r = yr * tr[tw + 1] - yi * ti[tw + 1];
                        double x1i = yr * ti[tw + 1] + yi * tr[tw + 1];
                        yr = aRe[(q + 2 * r) * lPrev + j];
                        yi = aIm[(q + 2 * r) * lPrev + j];
                        double x2r = yr * tr[tw + 2] - yi * ti[tw + 2];
                        double x2i = yr * ti[tw + 2] + yi * tr[tw + 2];
                        yr = aRe[(q + 3 * r) * lPrev + j];
                        yi = aIm[(q + 3 * r) * lPrev + j];
                        double x3r = yr * tr[tw + 3] - yi * ti[tw + 3];
                        double x3i = yr * ti[tw + 3] + yi * tr[tw + 3];
                        double s02r = x0r + x2r;
                        double s02i = x0i + x2i;
                        double d02r = x0r - x2r;
                        double d02i = x0i - x2i;
                        double s13r = x1r + x3r;
                        double s13i = x1i + x3i;
                        double d13r = x1r - x3r;
                        double d13i = x1i - x3i;
                        // -i * d13 = (d13i, -d13r)
                        bRe[out + j] = s02r + s13r;
                        bIm[out + j] = s02i + s13i;
                        bRe[out + j + lPrev] = d02r + d13i;
                        bIm[out + j + lPrev] = d02i - d13r;
                        bRe[out + j + 2 * lPrev] = s02r - s13r;
                        bIm[out + j + 2 * lPrev] = s02i - s13i;
                        bRe[out + j + 3 * lPrev] = d02r - d13i;
                        bIm[out + j + 3 * lPrev] = d02i + d13r;
                    }
                }
            }
            case 5 -> {
                final double c1 = Math.cos(2 * Math.PI / 5);
                final double c2 = Math.cos(4 * Math.PI / 5);
                final double s1 = Math.sin(2 * Math.PI / 5);
                final double s2 = Math.sin(4 * Math.PI / 5);
                for (int q = 0; q < r; q++) {
                    int out = q * l;
                    for (int j = 0; j < lPrev; j++) {
                        int tw = j * 5;
                        double x0r = aRe[q * lPrev + j];
                        double x0i = aIm[q * lPrev + j];
                        double yr = aRe[(q + r) * lPrev + j];
                        double yi = aIm[(q + r) * lPrev + j];
                        double x1r = yr * tr[tw + 1] - yi * ti[tw + 1];
                        double x1i = yr * ti[tw + 1] + yi * tr[tw + 1];
                        yr = aRe[(q + 2 * r) * lPrev + j];
                        yi = aIm[(q + 2 * r) * lPrev + j];
                        double x2r = yr * tr[tw + 2] - yi * ti[tw + 2];
                        double x2i = yr * ti[tw + 2] + yi * tr[tw + 2];
                        yr = aRe[(q + 3 * r) * lPrev + j];
                        yi = aIm[(q + 3 * r) * lPrev + j];
                        double x3r = yr * tr[tw + 3] - yi * ti[tw + 3];
                        double x3i = yr * ti[tw + 3] + yi * tr[tw + 3];
                        yr = aRe[(q + 4 * r) * lPrev + j];
                        yi = aIm[(q + 4 * r) * lPrev + j];
                        double x4r = yr * tr[tw + 4] - yi * ti[tw + 4];
                        double x4i = yr * ti[tw + 4] + yi * tr[tw + 4];
                        double t1r = x1r + x4r;
                        double t1i = x1i + x4i;
                        double t2r = x2r + x3r;
                        double t2i = x2i + x3i;
                        double t3r = x1r - x4r;
                        double t3i = x1i - x4i;
                        double t4r = x2r - x3r;
                        double t4i = x2i - x3i;
                        double a1r = x0r + c1 * t1r + c2 * t2r;
                        double a1i = x0i + c1 * t1i + c2 * t2i;
                        double a2r = x0r + c2 * t1r + c1 * t2r;
                        double a2i = x0i + c2 * t1i + c1 * t2i;
                        double b1r = s1 * t3r + s2 * t4r;
                        double b1i = s1 * t3i + s2 * t4i;
                        double b2r = s2 * t3r - s1 * t4r;
                        double b2i = s2 * t3i - s1 * t4i;
                        bRe[out + j] = x0r + t1r + t2r;
                        bIm[out + j] = x0i + t1i + t2i;
                        // y1 = a1 - i b1, y4 = a1 + i b1, y2 = a2 - i b2, y3 = a2 + i b2
                        bRe[out + j + lPrev] = a1r + b1i;
                        bIm[out + j + lPrev] = a1i - b1r;
                        bRe[out + j + 4 * lPrev] = a1r - b1i;
                        bIm[out + j + 4 * lPrev] = a1i + b1r;
                        bRe[out + j + 2 * lPrev] = a2r + b2i;
                        bIm[out + j + 2 * lPrev] = a2i - b2r;
                        bRe[out + j + 3 * lPrev] = a2r - b2i;
                        bIm[out + j + 3 * lPrev] = a2i + b2r;
                    }
                }
            }
            default -> {
                double[] xr = scratchRe;
                double[] xi = scratchIm;
                int cOff = p;
                double[] cr = scratchRe;
                double[] ci = scratchIm;
                for (int c = 0; c < p; c++) {
                    cr[cOff + c] = Math.cos(-2.0 * Math.PI * c / p);
                    ci[cOff + c] = Math.sin(-2.0 * Math.PI * c / p);
                }
                for (int q = 0; q < r; q++) {
                    int out = q * l;
                    for (int j = 0; j < lPrev; j++) {
                        for (int v = 0; v < p; v++) {
                            double yr = aRe[(q + v * r) * lPrev + j];
                            double yi = aIm[(q + v * r) * lPrev + j];
                            double wr = tr[j * p + v];
                            double wi = ti[j * p + v];
                            xr[v] = yr * wr - yi * wi;
                            xi[v] = yr * wi + yi * wr;
                        }
                        for (int c = 0; c < p; c++) {
                            double sr = 0;
                            double si = 0;
                            for (int v = 0; v < p; v++) {
                                int e = (c * v) % p;
                                sr += xr[v] * cr[cOff + e] - xi[v] * ci[cOff + e];
                                si += xr[v] * ci[cOff + e] + xi[v] * cr[cOff + e];
                            }
                            bRe[out + j + c * lPrev] = sr;
                            bIm[out + j + c * lPrev] = si;
                        }
                    }
                }
            }
        }
    }
}
