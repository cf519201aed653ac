package org.linemass.engine.pieces.marks;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.apache.commons.math3.geometry.euclidean.threed.Rotation;
import org.apache.commons.math3.geometry.euclidean.threed.RotationConvention;
import org.apache.commons.math3.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;

/** Kabsch fit against rotations built independently with Commons Math's {@link Rotation}. */
class RigidFitTest {

    private static double[][] cloud(Random rnd, int n) {
        double[][] p = new double[n][3];
        for (double[] q : p) {
            q[0] = rnd.nextGaussian();
            q[1] = rnd.nextGaussian() * 0.5;
            q[2] = rnd.nextGaussian() * 0.2;
        }
        return p;
    }

    private static double[][] moved(double[][] p, Rotation r, double[] t, boolean mirror) {
        double[][] out = new double[p.length][];
        for (int i = 0; i < p.length; i++) {
            Vector3D v = r.applyTo(new Vector3D(mirror ? -p[i][0] : p[i][0], p[i][1], p[i][2]));
            out[i] = new double[] {v.getX() + t[0], v.getY() + t[1], v.getZ() + t[2]};
        }
        return out;
    }

    @Test
    void anyRotationAndShift_isFoundExactly() {
        Random rnd = new Random(5);
        for (int k = 0; k < 50; k++) {
            double[][] a = cloud(rnd, 40);
            Rotation r = new Rotation(new Vector3D(rnd.nextGaussian(), rnd.nextGaussian(), rnd.nextGaussian()),
                    rnd.nextDouble() * 6, RotationConvention.VECTOR_OPERATOR);
            double[][] b = moved(a, r, new double[] {3, -2, 7}, false);
            // residual of an exact rigid copy: rounding only (points of size ~10, 1e-12 generous)
            assertEquals(0, RigidFit.maxDeviation(a, b, false), 1e-12);
        }
    }

    @Test
    void mirrorImageOfASpatialCloud_needsTheMirrorFlag() {
        Random rnd = new Random(9);
        double[][] a = cloud(rnd, 40);
        Rotation r = new Rotation(Vector3D.PLUS_K, 0.7, RotationConvention.VECTOR_OPERATOR);
        double[][] b = moved(a, r, new double[] {1, 1, 1}, true);
        assertEquals(0, RigidFit.maxDeviation(a, b, true), 1e-12);
        assertTrue(RigidFit.maxDeviation(a, b, false) > 0.1, "a proper rotation cannot undo a mirror");
    }
}
