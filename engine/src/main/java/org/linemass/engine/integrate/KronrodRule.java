package org.linemass.engine.integrate;

/**
 * The 21-point Gauss-Kronrod rule and its embedded 10-point Gauss-Legendre rule on [-1, 1]:
 * abscissae and weights as published with QUADPACK (Piessens, de Doncker-Kapenga, Ueberhuber,
 * Kahaner, 1983; values computed to 80 digits by L. W. Fullerton). The Kronrod rule is exact for
 * polynomials of degree 31, the Gauss rule for degree 19; the difference of the two estimates the
 * error of the Gauss rule and so bounds, generously, the error of the Kronrod result.
 */
final class KronrodRule {

    /** Non-negative Kronrod abscissae, descending; odd indices are the Gauss abscissae. */
    static final double[] XK = {
        0.995657163025808080735527280689003, 0.973906528517171720077964012084452,
        0.930157491355708226001207180059508, 0.865063366688984510732096688423493,
        0.780817726586416897063717578345042, 0.679409568299024406234327365114874,
        0.562757134668604683339000099272694, 0.433395394129247190799265943165784,
        0.294392862701460198131126603103866, 0.148874338981631210884826001129720,
        0.0};

    /** Kronrod weights matching {@link #XK}. */
    static final double[] WK = {
        0.011694638867371874278064396062192, 0.032558162307964727478818972459390,
        0.054755896574351996031381300244580, 0.075039674810919952767043140916190,
        0.093125454583697605535065465083366, 0.109387158802297641899210590325805,
        0.123491976262065851077958109831074, 0.134709217311473325928054001771707,
        0.142775938577060080797094273138717, 0.147739104901338491374841515972068,
        0.149445554002916905664936468389821};

    /** Gauss weights for the abscissae XK[1], XK[3], ..., XK[9]. */
    static final double[] WG = {
        0.066671344308688137593568809893332, 0.149451349150580593145776339657697,
        0.219086362515982043995534934228163, 0.269266719309996355091226921569469,
        0.295524224714752870173892994651338};

    /** Evaluations per application of the rule. */
    static final int POINTS = 21;

    private KronrodRule() {
    }
}
