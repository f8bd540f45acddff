package dev.morse.cycles;

import it.unimi.dsi.fastutil.ints.Int2ObjectOpenHashMap;
import java.math.BigInteger;

/**
 * One generator as handed to {@link CycleVerifier}: the cycle z, for a torsion generator over Z of
 * order t a chain y with {@code ∂y = t z}, and a cocycle φ with {@code φ(z) = 1} and {@code φ} zero
 * on the other generators of its dimension (modulo t for a torsion generator). The maps hold cells
 * of the complex with nonzero coefficients; {@code lifted} is the number of terms before shortening.
 *
 * @param dimension the dimension of z
 * @param order 0 for a free generator, else t
 * @param chain z
 * @param preimage y, or {@code null} unless the generator is torsion over Z
 * @param cocycle φ on cells of dimension {@code dimension}
 * @param lifted the number of terms of z right after the lift
 */
record Certificate(int dimension, BigInteger order, Int2ObjectOpenHashMap<BigInteger> chain,
        Int2ObjectOpenHashMap<BigInteger> preimage, Int2ObjectOpenHashMap<BigInteger> cocycle, int lifted) {
}
