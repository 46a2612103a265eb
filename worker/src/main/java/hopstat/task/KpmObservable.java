package hopstat.task;

/**
 * Marker for the kernel-polynomial observables: dense-free and without the slice sweep, so that
 * {@link RealisationCost} sizes them from the CSR matrix and a few vectors of length N.
 */
interface KpmObservable extends Observable {}
