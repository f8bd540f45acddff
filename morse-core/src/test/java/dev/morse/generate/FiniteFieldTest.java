package dev.morse.generate;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

class FiniteFieldTest {
    @Test
    void tablesSatisfyTheFieldAxioms() {
        // a finite commutative ring without zero divisors is a field (common practice); check every
        // axiom on the whole table for prime and prime power orders
        for (int q : new int[] {2, 3, 4, 5, 7, 8, 9, 16, 25, 27, 32}) {
            FiniteField f = FiniteField.of(q);
            for (int a = 0; a < q; a++) {
                assertEquals(a, f.plus(a, 0));
                assertEquals(a, f.times(a, 1));
                assertEquals(0, f.minus(a, a));
                if (a != 0) {
                    assertEquals(1, f.times(a, f.inverse(a)), "q = " + q + ", a = " + a);
                }
                for (int b = 0; b < q; b++) {
                    assertEquals(f.plus(a, b), f.plus(b, a));
                    assertEquals(f.times(a, b), f.times(b, a));
                    if (a != 0 && b != 0) {
                        assertEquals(false, f.times(a, b) == 0, "zero divisors in F_" + q);
                    }
                    for (int c = 0; c < q; c += 3) {
                        assertEquals(f.times(a, f.plus(b, c)), f.plus(f.times(a, b), f.times(a, c)));
                        assertEquals(f.times(f.times(a, b), c), f.times(a, f.times(b, c)));
                    }
                }
            }
        }
    }

    @Test
    void characteristicIsThePrime() {
        // adding 1 to itself p times gives 0 in F_(p^k) (common practice)
        for (int[] qp : new int[][] {{4, 2}, {9, 3}, {8, 2}, {25, 5}}) {
            FiniteField f = FiniteField.of(qp[0]);
            assertEquals(qp[1], f.characteristic());
            int sum = 0;
            for (int i = 0; i < qp[1]; i++) {
                sum = f.plus(sum, 1);
            }
            assertEquals(0, sum);
        }
    }

    @Test
    void orderMustBeAPrimePower() {
        assertThrows(IllegalArgumentException.class, () -> FiniteField.of(6));
        assertThrows(IllegalArgumentException.class, () -> FiniteField.of(1));
        assertThrows(IllegalArgumentException.class, () -> FiniteField.of(257));
    }
}
