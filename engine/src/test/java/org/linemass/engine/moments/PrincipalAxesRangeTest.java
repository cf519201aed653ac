package org.linemass.engine.moments;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** Principal axes at the edges of the double range: huge tensors work, non-finite ones give nothing. */
class PrincipalAxesRangeTest {

    @Test
    void hugeTensor_sameMomentsAsTheTensorOfOrderOneTimesTheScale() {
        // diag(1, 2, 3) rotated by 90 degrees about z is diag(2, 1, 3): moments 1, 2, 3 (closed form)
        double s = 1e300;
        PrincipalAxes p = PrincipalAxes.tryOf(new Sym3(2 * s, 0, 0, 1 * s, 0, 3 * s)).orElseThrow();
        double[] m = p.moments();
        // eigenvalues of a diagonal matrix are exact up to the iteration's rounding: 1e-12 relative
        assertEquals(1 * s, m[0], 1e-12 * s);
        assertEquals(2 * s, m[1], 1e-12 * s);
        assertEquals(3 * s, m[2], 1e-12 * s);
    }

    @Test
    void nonFiniteTensor_noAxes() {
        assertTrue(PrincipalAxes.tryOf(new Sym3(Double.NaN, 0, 0, 1, 0, 1)).isEmpty());
        assertTrue(PrincipalAxes.tryOf(new Sym3(Double.POSITIVE_INFINITY, 0, 0, 1, 0, 1)).isEmpty());
        assertThrows(IllegalArgumentException.class, () -> PrincipalAxes.of(new Sym3(1, Double.NaN, 0, 1, 0, 1)));
    }
}
