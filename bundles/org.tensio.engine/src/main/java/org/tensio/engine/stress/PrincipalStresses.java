package org.tensio.engine.stress;

import org.tensio.engine.geometry.Point2;

/**
 * Principal and equivalent stresses of the beam stress state (σz, τzx, τzy; the other components zero).
 * With τ = √(τzx² + τzy²) and R = √((σz/2)² + τ²): σ1 = σz/2 + R ≥ σ2 = 0 ≥ σ3 = σz/2 − R; τmax = R;
 * von Mises = √(σz² + 3τ²); Tresca = σ1 − σ3 = 2R. Directions are unit vectors (x, y, z) of the principal
 * axes; σ2's axis lies in the section plane, normal to the shear resultant.
 *
 * @param sigma1    largest principal stress
 * @param sigma2    middle principal stress (0)
 * @param sigma3    smallest principal stress
 * @param tauMax    maximum shear stress (σ1 − σ3)/2
 * @param vonMises  von Mises equivalent stress
 * @param tresca    Tresca equivalent stress σ1 − σ3
 * @param dir1      direction of σ1, {x, y, z}
 * @param dir2      direction of σ2, {x, y, z}
 * @param dir3      direction of σ3, {x, y, z}
 * @since 0.1
 */
public record PrincipalStresses(double sigma1, double sigma2, double sigma3, double tauMax, double vonMises,
        double tresca, double[] dir1, double[] dir2, double[] dir3) {

    /** @return the principal state of {@code s} */
    public static PrincipalStresses of(StressComponents s) {
        double sz = s.sigmaZ();
        double tau = s.tauResultant();
        double r = Math.hypot(sz / 2, tau);
        double s1 = sz / 2 + r;
        double s3 = sz / 2 - r;
        // in-plane unit vector along the shear resultant (x direction when there is no shear)
        double ux = tau > 0 ? s.tauZX() / tau : 1;
        double uy = tau > 0 ? s.tauZY() / tau : 0;
        // in the (u, z) plane the tensor is [[0, tau], [tau, sz]]; σ1 eigenvector (tau, s1), σ3 eigenvector (tau, s3)
        double[] d1 = direction(ux, uy, tau, s1, true);
        double[] d3 = direction(ux, uy, tau, s3, false);
        double[] d2 = {-uy, ux, 0};
        return new PrincipalStresses(s1, 0, s3, r, Math.sqrt(sz * sz + 3 * tau * tau), s1 - s3, d1, d2, d3);
    }

    private static double[] direction(double ux, double uy, double tau, double lambda, boolean major) {
        double a = tau, c = lambda; // components along u and z
        double len = Math.hypot(a, c);
        if (len == 0) {
            // pure zero state or uniaxial with the eigenvalue 0: major axis along z, minor along u
            return major ? new double[] {0, 0, 1} : new double[] {ux, uy, 0};
        }
        double cu = a / len, cz = c / len;
        if (cz < 0 || (cz == 0 && cu < 0)) {
            cu = -cu;
            cz = -cz;
        }
        return new double[] {cu * ux, cu * uy, cz};
    }
}
