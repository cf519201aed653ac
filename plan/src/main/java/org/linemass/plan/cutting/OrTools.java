package org.linemass.plan.cutting;

import com.google.ortools.Loader;

/** Loads OR-Tools' native library once; tells whether it could be loaded on this platform. */
final class OrTools {

    private static Boolean loaded;
    private static String problem = "";

    private OrTools() {
    }

    /** True when the solvers can be used; otherwise {@link #problem()} says why. */
    static synchronized boolean available() {
        if (loaded == null) {
            try {
                Loader.loadNativeLibraries();
                loaded = true;
            } catch (RuntimeException | LinkageError e) {
                loaded = false;
                problem = "the OR-Tools native library could not be loaded on this platform (" + e.getMessage() + ")";
            }
        }
        return loaded;
    }

    static synchronized String problem() {
        return problem;
    }
}
