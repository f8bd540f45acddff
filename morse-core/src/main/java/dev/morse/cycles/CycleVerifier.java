package dev.morse.cycles;

import dev.morse.complex.Boundary;
import dev.morse.complex.ChainComplex;
import dev.morse.homology.Coefficients;
import dev.morse.homology.Homology;
import dev.morse.homology.HomologyGroup;
import it.unimi.dsi.fastutil.ints.Int2ObjectMap;
import it.unimi.dsi.fastutil.ints.Int2ObjectOpenHashMap;
import java.math.BigInteger;
import java.util.List;

/**
 * Checks representative cycles on the complex itself, with nothing of the reduction that found them:
 * only the complex's boundary (its coboundary serves only to find the cells above a cochain's
 * support; each value φ(∂c) is summed from the boundary of c) and exact arithmetic written here. It checks
 * certificates (McConnell, Mehlhorn, Näher and Schweitzer, "Certifying algorithms", Computer
 * Science Review 5, 2011), so every check is a sparse product and the cost grows with the size of
 * the cycles and cocycles, not with a decomposition of the complex.
 *
 * <p>Over Z, in each dimension d, with free generators z_1..z_β, torsion generators w_1..w_m of
 * orders t_1..t_m, and the printed group H = Z^β ⊕ Z/t_1 ⊕ ... ⊕ Z/t_m:
 * <ol>
 *   <li>∂z_j = 0 and ∂w_i = 0;</li>
 *   <li>∂y_i = t_i w_i for the given chain y_i, so t_i w_i is a boundary;</li>
 *   <li>each free generator's cochain φ_j is a cocycle (φ_j(∂c) = 0 for every (d+1)-cell c), each
 *       torsion generator's ψ_i a cocycle modulo t_i;</li>
 *   <li>the matrix (φ_j(z_k)) has determinant ±1, and ψ_i(w_k) ≡ δ_ik modulo t_i.</li>
 * </ol>
 * Then the map A = Z^β ⊕ ⊕ Z/t_i → H_d sending the basis to the classes is well defined (2) and
 * injective: if Σ a_j z_j + Σ b_i w_i = ∂u, a cocycle kills ∂u, and an integer cocycle kills every
 * w_i (t_i φ(w_i) = φ(∂y_i) = 0), so applying the φ_j gives a = 0 by (4), then applying ψ_k modulo
 * t_k gives b_k ≡ 0. In particular each w_i has order exactly t_i, so (t_i/p) w_i is not a boundary
 * for any prime p | t_i. Its image splits off: the φ_j restrict to a left inverse on the free part
 * (4), so the free classes span a direct summand of H_d modulo torsion of rank β, and the torsion
 * classes a subgroup of order Π t_i of the torsion subgroup. When H_d is the printed group (which
 * the run computed and the tests compare with independent Smith normal forms) a direct summand of
 * rank β of Z^β is all of it and a subgroup of the torsion of full order is all of it, so the cycles
 * generate H_d. Over Q and Z/p the same with every generator free: the cocycles (exact over Q,
 * modulo p over Z/p) and a nonsingular pairing matrix prove the classes independent, and as many as
 * the printed Betti number they are a basis.
 *
 * <p>In dimension 0 the components, found here by union-find over the edges, certify H_0 instead
 * of cocycles (the cocycle of a component is as large as the component). For reduced homology the
 * 0-cycles must also have coefficient sum zero. Any failure is an
 * {@link IllegalStateException} naming the check; no cycle is then printed.
 */
final class CycleVerifier {
    private final ChainComplex complex;
    private final Coefficients ring;
    private final BigInteger prime;
    private final Boundary boundary;
    private final Boundary cofaces;

    private CycleVerifier(ChainComplex complex, Coefficients ring) {
        this.complex = complex;
        this.ring = ring;
        this.prime = ring.ring() == Coefficients.Ring.PRIME_FIELD ? BigInteger.valueOf(ring.prime()) : BigInteger.ZERO;
        this.boundary = complex.boundary();
        this.cofaces = complex.coboundary();
    }

    /**
     * Checks {@code certificates} against {@code homology} on {@code complex}.
     *
     * @throws IllegalStateException naming the first check that fails
     */
    static void verify(ChainComplex complex, Coefficients ring, Homology homology, List<Certificate> certificates) {
        CycleVerifier verifier = new CycleVerifier(complex, ring);
        for (HomologyGroup group : homology.groups()) {
            int d = group.dimension();
            if (d < 0) {
                continue;
            }
            List<Certificate> here = certificates.stream().filter(c -> c.dimension() == d).toList();
            verifier.verifyDimension(group, here, homology.reduced() && d == 0);
        }
        long placed = homology.groups().stream().filter(g -> g.dimension() >= 0)
                .mapToLong(g -> g.betti() + (ring.ring() == Coefficients.Ring.INTEGERS ? g.torsion().size() : 0)).sum();
        if (placed != certificates.size()) {
            fail(certificates.size() + " cycles for " + placed + " generators");
        }
    }

    private void verifyDimension(HomologyGroup group, List<Certificate> here, boolean reducedZero) {
        int d = group.dimension();
        List<Certificate> free = here.stream().filter(c -> c.order().signum() == 0).toList();
        List<Certificate> torsion = here.stream().filter(c -> c.order().signum() > 0).toList();
        if (free.size() != group.betti()) {
            fail("H_" + d + " has rank " + group.betti() + " but " + free.size() + " free cycles were found");
        }
        List<BigInteger> expectedTorsion = ring.ring() == Coefficients.Ring.INTEGERS ? group.torsion() : List.of();
        if (!torsion.stream().map(Certificate::order).toList().equals(expectedTorsion)) {
            fail("H_" + d + " has torsion " + expectedTorsion + " but the cycles have orders "
                    + torsion.stream().map(Certificate::order).toList());
        }
        for (Certificate c : here) {
            requireZero(boundaryOf(c.chain()), BigInteger.ZERO, "the boundary of a " + d + "-cycle is not zero");
            if (reducedZero && !reduce(c.chain().values().stream().reduce(BigInteger.ZERO, BigInteger::add),
                    prime).equals(BigInteger.ZERO)) {
                fail("a reduced 0-cycle has a coefficient sum other than zero");
            }
        }
        for (Certificate c : torsion) {
            if (c.preimage() == null) {
                fail("a torsion cycle of dimension " + d + " came without a chain it bounds");
            }
            Int2ObjectOpenHashMap<BigInteger> difference = boundaryOf(c.preimage());
            c.chain().int2ObjectEntrySet().forEach(e -> difference.merge(e.getIntKey(),
                    e.getValue().multiply(c.order()).negate(), BigInteger::add));
            requireZero(difference, BigInteger.ZERO, "t·z is not the boundary of the chain given for a torsion "
                    + d + "-cycle of order " + c.order());
        }
        if (d == 0) {
            requireComponentBasis(free, reducedZero);
            return;
        }
        for (Certificate c : here) {
            requireZero(coboundaryOf(c.cocycle(), d), c.order(), "the cochain certifying a " + d + "-cycle is not a cocycle");
        }
        requireUnimodular(free, d);
        for (Certificate psi : torsion) {
            for (Certificate w : torsion) {
                BigInteger value = pair(psi.cocycle(), w.chain()).mod(psi.order());
                if (!value.equals(psi == w ? BigInteger.ONE.mod(psi.order()) : BigInteger.ZERO)) {
                    fail("the torsion cycles of dimension " + d + " are not independent of the orders claimed");
                }
            }
        }
    }

    /**
     * H_0 is free on the components (found here by union-find over the edges): the 0-cycles are a
     * basis when the matrix of their coefficient sums per component is unimodular (over a field:
     * nonsingular). In reduced homology the cycles lie in the kernel of the augmentation, a direct
     * summand of rank one less; they are a basis of it when, with one vertex added, they are a basis of
     * the whole: if k = Σ a_i z_i + b v has augmentation 0 then b = 0.
     */
    private void requireComponentBasis(List<Certificate> free, boolean reduced) {
        int first = complex.firstCell(0);
        int vertices = complex.cellCount(0);
        int[] parent = new int[vertices];
        for (int v = 0; v < vertices; v++) {
            parent[v] = v;
        }
        int firstEdge = complex.firstCell(1);
        for (int e = firstEdge; e < firstEdge + complex.cellCount(1); e++) {
            int root = -1;
            for (int i = boundary.start(e); i < boundary.end(e); i++) {
                int r = find(parent, boundary.target(i) - first);
                if (root < 0) {
                    root = r;
                } else if (r != root) {
                    parent[r] = root;
                }
            }
        }
        int[] component = new int[vertices];
        java.util.Arrays.fill(component, -1);
        int components = 0;
        for (int v = 0; v < vertices; v++) {
            int r = find(parent, v);
            if (component[r] < 0) {
                component[r] = components++;
            }
        }
        int columns = free.size() + (reduced && components > 0 ? 1 : 0);
        if (columns != components) {
            fail("H_0 has " + components + " components but " + free.size() + " cycles were found");
        }
        BigInteger[][] m = new BigInteger[components][columns];
        for (BigInteger[] row : m) {
            java.util.Arrays.fill(row, BigInteger.ZERO);
        }
        for (int j = 0; j < free.size(); j++) {
            for (Int2ObjectMap.Entry<BigInteger> e : free.get(j).chain().int2ObjectEntrySet()) {
                int row = component[find(parent, e.getIntKey() - first)];
                m[row][j] = m[row][j].add(e.getValue());
            }
        }
        if (columns > free.size()) {
            m[0][columns - 1] = BigInteger.ONE; // a vertex of the first component
        }
        for (BigInteger[] row : m) {
            for (int j = 0; j < columns; j++) {
                row[j] = reduce(row[j], prime);
            }
        }
        BigInteger det = determinant(m, prime);
        boolean ok = ring.ring() == Coefficients.Ring.INTEGERS ? det.abs().equals(BigInteger.ONE) : det.signum() != 0;
        if (!ok) {
            fail("the 0-cycles are not a basis of the components (determinant " + det + ")");
        }
    }

    private static int find(int[] parent, int v) {
        while (parent[v] != v) {
            parent[v] = parent[parent[v]];
            v = parent[v];
        }
        return v;
    }

    /** The pairing of the free cycles with their cocycles: determinant ±1 over Z, nonzero over Q, nonzero mod p. */
    private void requireUnimodular(List<Certificate> free, int d) {
        int k = free.size();
        BigInteger[][] m = new BigInteger[k][k];
        boolean identity = true;
        for (int i = 0; i < k; i++) {
            for (int j = 0; j < k; j++) {
                m[i][j] = reduce(pair(free.get(i).cocycle(), free.get(j).chain()), prime);
                identity &= m[i][j].equals(i == j ? BigInteger.ONE : BigInteger.ZERO);
            }
        }
        if (identity) {
            return;
        }
        BigInteger det = determinant(m, prime);
        boolean ok = switch (ring.ring()) {
            case INTEGERS -> det.abs().equals(BigInteger.ONE);
            case RATIONALS, PRIME_FIELD -> det.signum() != 0;
        };
        if (!ok) {
            fail("the free cycles of dimension " + d + " are not independent (pairing determinant " + det + ")");
        }
    }

    /** The determinant by fraction-free elimination (Bareiss 1968), modulo {@code modulus} when it is positive. */
    static BigInteger determinant(BigInteger[][] a, BigInteger modulus) {
        int n = a.length;
        BigInteger signed = signedPermutation(a, modulus);
        if (signed != null) {
            return signed;
        }
        BigInteger[][] m = new BigInteger[n][];
        for (int i = 0; i < n; i++) {
            m[i] = a[i].clone();
        }
        if (modulus.signum() > 0) {
            BigInteger det = BigInteger.ONE;
            for (int c = 0; c < n; c++) {
                int swapped = pivotToDiagonal(m, c, modulus);
                if (swapped < 0) {
                    return BigInteger.ZERO;
                }
                if (swapped > 0) {
                    det = det.negate();
                }
                BigInteger inverse = m[c][c].modInverse(modulus);
                det = det.multiply(m[c][c]).mod(modulus);
                for (int i = c + 1; i < n; i++) {
                    BigInteger f = m[i][c].multiply(inverse).mod(modulus);
                    for (int j = c; j < n; j++) {
                        m[i][j] = m[i][j].subtract(f.multiply(m[c][j])).mod(modulus);
                    }
                }
            }
            return det.mod(modulus);
        }
        BigInteger previous = BigInteger.ONE;
        int sign = 1;
        for (int c = 0; c < n; c++) {
            int swapped = pivotToDiagonal(m, c, modulus);
            if (swapped < 0) {
                return BigInteger.ZERO;
            }
            if (swapped > 0) {
                sign = -sign;
            }
            for (int i = c + 1; i < n; i++) {
                for (int j = c + 1; j < n; j++) {
                    m[i][j] = m[i][j].multiply(m[c][c]).subtract(m[i][c].multiply(m[c][j])).divide(previous);
                }
                m[i][c] = BigInteger.ZERO;
            }
            previous = m[c][c];
        }
        return n == 0 ? BigInteger.ONE : sign > 0 ? m[n - 1][n - 1] : m[n - 1][n - 1].negate();
    }

    /**
     * Brings a row with a nonzero entry in column {@code c} (modulo {@code modulus} when it is
     * positive), at or below row c, to row c: returns 0 when row c had one, 1 after a swap, and -1
     * when there is none, so the determinant is 0.
     */
    private static int pivotToDiagonal(BigInteger[][] m, int c, BigInteger modulus) {
        int r = c;
        while (r < m.length && (modulus.signum() > 0 ? m[r][c].mod(modulus) : m[r][c]).signum() == 0) {
            r++;
        }
        if (r == m.length) {
            return -1;
        }
        if (r == c) {
            return 0;
        }
        BigInteger[] t = m[r];
        m[r] = m[c];
        m[c] = t;
        return 1;
    }

    /**
     * The determinant when every row has one nonzero entry, ±1, in distinct columns (the common case,
     * checked in quadratic time): the sign of the permutation times the entries; else null.
     */
    private static BigInteger signedPermutation(BigInteger[][] a, BigInteger modulus) {
        int n = a.length;
        int[] column = new int[n];
        boolean[] used = new boolean[n];
        BigInteger det = BigInteger.ONE;
        for (int i = 0; i < n; i++) {
            column[i] = -1;
            for (int j = 0; j < n; j++) {
                if (reduce(a[i][j], modulus).signum() != 0) {
                    BigInteger v = modulus.signum() > 0 ? a[i][j].mod(modulus) : a[i][j];
                    boolean unit = v.abs().equals(BigInteger.ONE)
                            || modulus.signum() > 0 && v.equals(modulus.subtract(BigInteger.ONE));
                    if (column[i] >= 0 || used[j] || !unit) {
                        return null;
                    }
                    column[i] = j;
                    used[j] = true;
                    det = det.multiply(v.abs().equals(BigInteger.ONE) ? v : BigInteger.ONE.negate());
                }
            }
            if (column[i] < 0) {
                return BigInteger.ZERO;
            }
        }
        boolean[] seen = new boolean[n];
        for (int i = 0; i < n; i++) {
            if (!seen[i]) {
                int length = 0;
                for (int j = i; !seen[j]; j = column[j]) {
                    seen[j] = true;
                    length++;
                }
                if (length % 2 == 0) {
                    det = det.negate();
                }
            }
        }
        return reduce(det, modulus);
    }

    private static BigInteger pair(Int2ObjectOpenHashMap<BigInteger> cochain, Int2ObjectOpenHashMap<BigInteger> chain) {
        BigInteger sum = BigInteger.ZERO;
        Int2ObjectOpenHashMap<BigInteger> small = chain.size() <= cochain.size() ? chain : cochain;
        Int2ObjectOpenHashMap<BigInteger> large = small == chain ? cochain : chain;
        for (Int2ObjectMap.Entry<BigInteger> e : small.int2ObjectEntrySet()) {
            BigInteger other = large.get(e.getIntKey());
            if (other != null) {
                sum = sum.add(other.multiply(e.getValue()));
            }
        }
        return sum;
    }

    private Int2ObjectOpenHashMap<BigInteger> boundaryOf(Int2ObjectOpenHashMap<BigInteger> chain) {
        Int2ObjectOpenHashMap<BigInteger> faces = new Int2ObjectOpenHashMap<>();
        for (Int2ObjectMap.Entry<BigInteger> e : chain.int2ObjectEntrySet()) {
            int cell = e.getIntKey();
            for (int i = boundary.start(cell); i < boundary.end(cell); i++) {
                faces.merge(boundary.target(i), e.getValue().multiply(BigInteger.valueOf(boundary.coefficient(i))),
                        BigInteger::add);
            }
        }
        return faces;
    }

    /** φ(∂c) for every (d+1)-cell c with a face in the support of φ, found through the complex's coboundary. */
    private Int2ObjectOpenHashMap<BigInteger> coboundaryOf(Int2ObjectOpenHashMap<BigInteger> cochain, int d) {
        Int2ObjectOpenHashMap<BigInteger> values = new Int2ObjectOpenHashMap<>();
        if (d >= complex.dimension()) {
            return values;
        }
        for (Int2ObjectMap.Entry<BigInteger> e : cochain.int2ObjectEntrySet()) {
            int cell = e.getIntKey();
            for (int i = cofaces.start(cell); i < cofaces.end(cell); i++) {
                int c = cofaces.target(i);
                if (!values.containsKey(c)) {
                    BigInteger v = BigInteger.ZERO;
                    for (int j = boundary.start(c); j < boundary.end(c); j++) {
                        BigInteger phi = cochain.get(boundary.target(j));
                        if (phi != null) {
                            v = v.add(phi.multiply(BigInteger.valueOf(boundary.coefficient(j))));
                        }
                    }
                    values.put(c, v);
                }
            }
        }
        return values;
    }

    /** Every value zero modulo {@code modulus} (exactly when 0), and modulo p over Z/p. */
    private void requireZero(Int2ObjectOpenHashMap<BigInteger> values, BigInteger modulus, String failure) {
        BigInteger m = prime.signum() > 0 ? prime : modulus;
        for (BigInteger v : values.values()) {
            if (reduce(v, m).signum() != 0) {
                fail(failure);
            }
        }
    }

    private static BigInteger reduce(BigInteger a, BigInteger modulus) {
        return modulus.signum() > 0 ? a.mod(modulus) : a;
    }

    private static void fail(String what) {
        throw new IllegalStateException("representative cycles failed their check: " + what);
    }
}
