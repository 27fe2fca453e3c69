package org.tensio.engine.profile;

/**
 * Expected area moments about the origin, built by hand from signed rectangles and quarter discs; written
 * independently of the contour code under test (no Green's theorem, no segments).
 * <p>
 * Sources: geometry, hand derivation written out here.
 * <ul>
 * <li>Rectangle [x0, x1] × [y0, y1]: A = Δx Δy, ∫x dA = A (x0 + x1)/2, ∫x² dA = Δy (x1³ − x0³)/3,
 * ∫xy dA = (x1² − x0²)(y1² − y0²)/4 (and the same with x, y swapped).</li>
 * <li>Quarter disc of radius r about C = (cx, cy), in the quadrant of direction (qx, qy), qx, qy = ±1; in
 * polar co-ordinates about C, x = cx + ρ cos θ over a quarter turn: A = πr²/4,
 * ∫(x − cx) dA = qx r³/3, ∫(x − cx)² dA = r⁴/4 · ∫cos²θ dθ = πr⁴/16,
 * ∫(x − cx)(y − cy) dA = r⁴/4 · ∫sinθ cosθ dθ = qx qy r⁴/8; shifted to the origin with the parallel-axis
 * terms.</li>
 * <li>Spandrel (the material a fillet of radius r adds in a corner, or an edge rounding removes): the
 * r × r square between the corner V and V + r (sx, sy) minus the quarter disc about V + r (sx, sy) in the
 * quadrant (−sx, −sy). Area (1 − π/4) r².</li>
 * </ul>
 */
final class Composite {

    double area;
    double sx;
    double sy;
    double sxx;
    double syy;
    double sxy;

    /** Adds (sign = +1) or removes (sign = −1) the rectangle [x0, x1] × [y0, y1]. */
    Composite rect(double x0, double y0, double x1, double y1, int sign) {
        double dx = x1 - x0;
        double dy = y1 - y0;
        double a = dx * dy;
        area += sign * a;
        sx += sign * a * (x0 + x1) / 2;
        sy += sign * a * (y0 + y1) / 2;
        sxx += sign * dy * (x1 * x1 * x1 - x0 * x0 * x0) / 3;
        syy += sign * dx * (y1 * y1 * y1 - y0 * y0 * y0) / 3;
        sxy += sign * (x1 * x1 - x0 * x0) * (y1 * y1 - y0 * y0) / 4;
        return this;
    }

    /** Adds or removes the quarter disc of radius r about (cx, cy) lying in quadrant direction (qx, qy). */
    Composite quarterDisc(double cx, double cy, double r, int qx, int qy, int sign) {
        double a = Math.PI * r * r / 4;
        double mx = qx * r * r * r / 3; // ∫(x − cx) dA
        double my = qy * r * r * r / 3;
        double m2 = Math.PI * r * r * r * r / 16; // ∫(x − cx)² dA = ∫(y − cy)² dA
        double mxy = qx * qy * r * r * r * r / 8;
        area += sign * a;
        sx += sign * (mx + cx * a);
        sy += sign * (my + cy * a);
        sxx += sign * (m2 + 2 * cx * mx + cx * cx * a);
        syy += sign * (m2 + 2 * cy * my + cy * cy * a);
        sxy += sign * (mxy + cx * my + cy * mx + cx * cy * a);
        return this;
    }

    /** Adds (a fillet) or removes (an edge rounding) the spandrel in corner (vx, vy), its square towards (dirX, dirY). */
    Composite spandrel(double vx, double vy, double r, int dirX, int dirY, int sign) {
        if (r == 0) {
            return this;
        }
        double x1 = vx + dirX * r;
        double y1 = vy + dirY * r;
        rect(Math.min(vx, x1), Math.min(vy, y1), Math.max(vx, x1), Math.max(vy, y1), sign);
        return quarterDisc(x1, y1, r, -dirX, -dirY, -sign);
    }

    /** The rectangle [−hx, hx] × [−hy, hy] with all four corners rounded to radius r, added or removed. */
    Composite roundedRect(double hx, double hy, double r, int sign) {
        rect(-hx, -hy, hx, hy, sign);
        spandrel(hx, hy, r, -1, -1, -sign);
        spandrel(-hx, hy, r, 1, -1, -sign);
        spandrel(-hx, -hy, r, 1, 1, -sign);
        return spandrel(hx, -hy, r, -1, 1, -sign);
    }
}
