package org.tensio.engine.fatigue;

import java.util.List;

import org.tensio.engine.geometry.Point2;

/**
 * Where on the section a notch raises the stress: its factors apply to the sample points it covers and to no
 * others (elsewhere Kf = Kfs = 1). Coordinates in the section frame, length unit of the project.
 *
 * @since 0.1
 */
public sealed interface NotchLocation {

    /**
     * @param x         sample x
     * @param y         sample y
     * @param onSurface true when the sample lies on the section's boundary (outer or inner)
     * @param centroid  the section's centroid
     * @return true when the notch acts at this sample
     */
    boolean covers(double x, double y, boolean onSurface, Point2 centroid);

    /** @return a description for reports */
    String describe();

    /**
     * Every sample on the section's boundary, outer and inner (a shoulder fillet or a groove all round a
     * shaft acts at its outer fibre).
     */
    record Surface() implements NotchLocation {
        @Override
        public boolean covers(double x, double y, boolean onSurface, Point2 centroid) {
            return onSurface;
        }

        @Override
        public String describe() {
            return "the section's surface";
        }
    }

    /**
     * The samples whose distance from the centroid lies in [rMin, rMax] (a band of radius about the axis).
     *
     * @param rMin inner radius, ≥ 0
     * @param rMax outer radius, ≥ rMin
     */
    record RadiusBand(double rMin, double rMax) implements NotchLocation {
        /** Validates the radii. */
        public RadiusBand {
            if (!(rMin >= 0) || !(rMax >= rMin) || !Double.isFinite(rMax)) {
                throw new IllegalArgumentException("radiusBand: needs 0 ≤ rMin ≤ rMax, got [" + rMin + ", " + rMax + "]");
            }
        }

        @Override
        public boolean covers(double x, double y, boolean onSurface, Point2 centroid) {
            double r = Math.hypot(x - centroid.x(), y - centroid.y());
            double tol = 1e-9 * Math.max(1, rMax);
            return r >= rMin - tol && r <= rMax + tol;
        }

        @Override
        public String describe() {
            return "radius " + MarinFactors.n(rMin) + " to " + MarinFactors.n(rMax) + " from the centroid";
        }
    }

    /**
     * The samples within a distance of given points (a keyseat's corners, a hole's edge).
     *
     * @param points the points, at least one
     * @param within the distance, &gt; 0
     */
    record NearPoints(List<Point2> points, double within) implements NotchLocation {
        /** Copies the list; validates. */
        public NearPoints {
            if (points == null || points.isEmpty()) {
                throw new IllegalArgumentException("points: at least one point is needed");
            }
            points = List.copyOf(points);
            if (!(within > 0) || !Double.isFinite(within)) {
                throw new IllegalArgumentException("within: must be positive, got " + within);
            }
        }

        @Override
        public boolean covers(double x, double y, boolean onSurface, Point2 centroid) {
            for (Point2 p : points) {
                if (Math.hypot(x - p.x(), y - p.y()) <= within) {
                    return true;
                }
            }
            return false;
        }

        @Override
        public String describe() {
            StringBuilder sb = new StringBuilder("within " + MarinFactors.n(within) + " of ");
            for (int i = 0; i < points.size(); i++) {
                sb.append(i == 0 ? "" : ", ").append('(').append(MarinFactors.n(points.get(i).x())).append(", ")
                        .append(MarinFactors.n(points.get(i).y())).append(')');
            }
            return sb.toString();
        }
    }
}
