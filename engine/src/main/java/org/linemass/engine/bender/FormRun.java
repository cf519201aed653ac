package org.linemass.engine.bender;

import java.util.List;
import org.linemass.geometry.Provenance;
import org.linemass.geometry.Vec3;

/**
 * One run of a piece's centre-line, in order from the piece's start: a straight {@link Feed}, a
 * {@link Turn} (a bend) or a {@link Wind} (a coil or ring). World metres, angles in radians.
 */
public sealed interface FormRun permits FormRun.Feed, FormRun.Turn, FormRun.Wind {

    /** Centre-line length of the run, metres. */
    double lengthM();

    /** The entities the run is drawn with, in order (repeats removed). */
    List<Provenance> sources();

    /**
     * A straight run: collinear straights, or a curve that turns by less than the angle tolerance.
     * {@code direction} is the unit direction of travel.
     */
    record Feed(Vec3 start, Vec3 end, Vec3 direction, double lengthM, List<Provenance> sources)
            implements FormRun {

        public Feed {
            sources = List.copyOf(sources);
        }
    }

    /**
     * A bend: the tangent turns from {@code tangentIn} to {@code tangentOut} by {@code angleRad} (the
     * total turning along the run, so a 180 degree hook is 180 degrees) about {@code axis} (unit,
     * right-handed: the bend turns the direction of travel about it; null only for a sharp 180 degree
     * reversal, whose plane is not defined). A sharp corner has length 0 and no radius. For a run of
     * circular arcs on one circle {@code circleRadiusM} is its centre-line radius; {@code minRadiusM} is
     * the smallest centre-line radius of curvature along the run (the circle's radius for arcs, null
     * for a sharp corner). {@code planar} says whether the run lies in one plane (within the join
     * tolerance); a non-planar bend is not one bender step exactly. {@code middle} is the point half
     * way along the run.
     */
    record Turn(Vec3 start, Vec3 end, Vec3 middle, double angleRad, Vec3 axis, Vec3 tangentIn, Vec3 tangentOut,
            double lengthM, Double circleRadiusM, Double minRadiusM, boolean planar, List<Provenance> sources)
            implements FormRun {

        public Turn {
            sources = List.copyOf(sources);
        }

        /** Whether the bend is a corner with no radius. */
        public boolean sharp() {
            return minRadiusM == null;
        }
    }

    /**
     * A coil or a ring (a curved run that winds once or more about one axis, or a closed piece with no
     * straight): number of turns, pitch (axial advance per turn, 0 for a flat ring or spiral), mean
     * (centre-line) diameter and the coil's unit axis. {@code closed} for a ring closed on itself.
     */
    record Wind(Vec3 start, Vec3 end, Vec3 tangentIn, Vec3 tangentOut, double turns, double pitchM,
            double meanDiameterM, Vec3 axis, double lengthM, boolean closed, List<Provenance> sources)
            implements FormRun {

        public Wind {
            sources = List.copyOf(sources);
        }
    }
}
