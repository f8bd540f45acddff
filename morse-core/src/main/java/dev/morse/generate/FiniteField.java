package dev.morse.generate;

/**
 * The finite field with {@code q = p^k} elements for a prime p, as the polynomials over Z/p of
 * degree below k modulo the first monic irreducible polynomial of degree k in a fixed order.
 * Element {@code a} stands for the polynomial whose coefficients are the base-p digits of a, lowest
 * first, so 0 and 1 are the field's zero and one and, for k = 1, a is the residue a. All
 * operations are table look-ups (common practice; e.g. Lidl and Niederreiter, Finite Fields, 1997,
 * Ch. 1, from memory).
 *
 * <p>Memory: {@code 8 q²} bytes for the addition and multiplication tables.
 */
final class FiniteField {
    /** Largest field accepted: its tables then take half a megabyte. */
    static final int MAX_ORDER = 256;

    private final int order;
    private final int characteristic;
    private final int[] sum;
    private final int[] product;
    private final int[] inverse;
    private final int[] negative;

    private FiniteField(int order, int characteristic, int degree) {
        this.order = order;
        this.characteristic = characteristic;
        int[] modulus = degree == 1 ? new int[] {0, 1} : irreducible(characteristic, degree);
        sum = new int[order * order];
        product = new int[order * order];
        inverse = new int[order];
        negative = new int[order];
        for (int a = 0; a < order; a++) {
            for (int b = 0; b < order; b++) {
                sum[a * order + b] = add(a, b);
                product[a * order + b] = multiply(a, b, degree, modulus);
            }
        }
        for (int a = 0; a < order; a++) {
            for (int b = 0; b < order; b++) {
                if (product[a * order + b] == 1) {
                    inverse[a] = b;
                }
                if (sum[a * order + b] == 0) {
                    negative[a] = b;
                }
            }
        }
    }

    /**
     * The field of order {@code q}.
     *
     * @throws IllegalArgumentException unless q is a prime power no larger than {@value #MAX_ORDER}
     */
    static FiniteField of(int q) {
        if (q < 2 || q > MAX_ORDER) {
            throw new IllegalArgumentException("q must be a prime power in 2.." + MAX_ORDER + ", got " + q);
        }
        int p = 2;
        while (q % p != 0) {
            p++;
        }
        int k = 0;
        int rest = q;
        while (rest % p == 0) {
            rest /= p;
            k++;
        }
        if (rest != 1) {
            throw new IllegalArgumentException("q must be a prime power, got " + q);
        }
        return new FiniteField(q, p, k);
    }

    int order() {
        return order;
    }

    int characteristic() {
        return characteristic;
    }

    int plus(int a, int b) {
        return sum[a * order + b];
    }

    int minus(int a, int b) {
        return sum[a * order + negative[b]];
    }

    int times(int a, int b) {
        return product[a * order + b];
    }

    /** The inverse of a nonzero element. */
    int inverse(int a) {
        if (a == 0) {
            throw new ArithmeticException("zero has no inverse");
        }
        return inverse[a];
    }

    /** Digit-wise sum modulo p. */
    private int add(int a, int b) {
        int result = 0;
        int place = 1;
        while (a > 0 || b > 0) {
            result += ((a % characteristic + b % characteristic) % characteristic) * place;
            a /= characteristic;
            b /= characteristic;
            place *= characteristic;
        }
        return result;
    }

    private int multiply(int a, int b, int degree, int[] modulus) {
        int p = characteristic;
        int[] x = digits(a, degree);
        int[] y = digits(b, degree);
        int[] z = new int[2 * degree];
        for (int i = 0; i < degree; i++) {
            for (int j = 0; j < degree; j++) {
                z[i + j] = (z[i + j] + x[i] * y[j]) % p;
            }
        }
        // reduce modulo the monic modulus of degree k: t^k = -(m_0 + ... + m_(k-1) t^(k-1))
        for (int top = 2 * degree - 1; top >= degree; top--) {
            int c = z[top];
            if (c != 0) {
                z[top] = 0;
                for (int i = 0; i < degree; i++) {
                    z[top - degree + i] = Math.floorMod(z[top - degree + i] - c * modulus[i], p);
                }
            }
        }
        int result = 0;
        for (int i = degree - 1; i >= 0; i--) {
            result = result * p + z[i];
        }
        return result;
    }

    private int[] digits(int a, int length) {
        int[] d = new int[length];
        for (int i = 0; i < length; i++) {
            d[i] = a % characteristic;
            a /= characteristic;
        }
        return d;
    }

    /**
     * The first monic irreducible polynomial of degree k over Z/p, coefficients lowest first
     * (k + 1 of them), in the order of the base-p value of its lower coefficients. A polynomial
     * without a root may still factor, so irreducibility is tested by trial division by every
     * monic polynomial of degree 1 to k/2.
     */
    private static int[] irreducible(int p, int k) {
        int count = 1;
        for (int i = 0; i < k; i++) {
            count *= p;
        }
        for (int code = 0; code < count; code++) {
            int[] f = monic(code, p, k);
            if (isIrreducible(f, p)) {
                return f;
            }
        }
        throw new IllegalStateException("every degree has an irreducible polynomial over a prime field");
    }

    private static int[] monic(int code, int p, int degree) {
        int[] f = new int[degree + 1];
        for (int i = 0; i < degree; i++) {
            f[i] = code % p;
            code /= p;
        }
        f[degree] = 1;
        return f;
    }

    private static boolean isIrreducible(int[] f, int p) {
        int k = f.length - 1;
        for (int d = 1; d <= k / 2; d++) {
            int count = 1;
            for (int i = 0; i < d; i++) {
                count *= p;
            }
            for (int code = 0; code < count; code++) {
                if (divides(monic(code, p, d), f, p)) {
                    return false;
                }
            }
        }
        return true;
    }

    /** Whether the monic g divides f over Z/p, by long division. */
    private static boolean divides(int[] g, int[] f, int p) {
        int[] r = f.clone();
        int dg = g.length - 1;
        for (int top = r.length - 1; top >= dg; top--) {
            int c = r[top];
            if (c != 0) {
                for (int i = 0; i <= dg; i++) {
                    r[top - dg + i] = Math.floorMod(r[top - dg + i] - c * g[i], p);
                }
            }
        }
        for (int i = 0; i < dg; i++) {
            if (r[i] != 0) {
                return false;
            }
        }
        return true;
    }
}
