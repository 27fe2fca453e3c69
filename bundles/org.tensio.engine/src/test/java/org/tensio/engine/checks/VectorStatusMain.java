package org.tensio.engine.checks;

/**
 * Run by {@link VectorEnvelopeKernelTest} in a child JVM: prints the kernel's implementation status, the
 * implementation of a small automatic run and what an explicit VECTOR request gives.
 */
public final class VectorStatusMain {

    private VectorStatusMain() {
    }

    public static void main(String[] args) {
        double[] a = {1, 2, 3};
        EnvelopeKernel k = new EnvelopeKernel(a, a, a, a, a, a, a, a, a);
        double[] f = {1, 2, 3, 4, 5, 6};
        System.out.println(k.envelope(f).implementation() + ": " + EnvelopeKernel.vectorStatus());
        try {
            k.envelope(f, EnvelopeKernel.Options.defaults().withImplementation(EnvelopeKernel.Implementation.VECTOR));
            System.out.println("VECTOR ran");
        } catch (IllegalStateException e) {
            System.out.println("VECTOR refused: " + e.getMessage());
        }
    }
}
