"""Numeric functions of the clauses, written by calcsheet.standards.write_clause_code.

Do not edit: run ``python -m calcsheet.standards.write_clause_code`` after changing a
clause (a test says when). Each function is sympy's NumPy printing of the clause's
expression; the key is :attr:`calcsheet.standards.clause.Clause.code_key`.
"""

# ruff: noqa

import functools

import numpy

# The printer writes Abs as a bare abs(), which lambdify's NumPy namespace makes numpy's.
abs = numpy.absolute

def _00c8dea2b6d2c695a39b(E, f_y):
    # EN 1993-1-1 6.3.1.3(1): Slenderness at which the Euler stress equals f_y
    return numpy.pi*numpy.sqrt(E/f_y)


def _02edf9672d435a483665(E, F_y):
    # AISC 360-22 Table B4.1b Case 10: Limit λr, flange of a rolled I-shape, flexure
    return 1.0*numpy.sqrt(E/F_y)


def _02f1d2811f39b7ec8635(F_y):
    # AISC 360-22 Eq. H3-7: Nominal stress, yielding under normal stress
    return F_y


def _0429c11d2458d362675c(N_c, A, M, W_el, h, c):
    # EN 1993-1-1 Table 5.2 (sheet 1): End stress ratio ψ of an internal part
    return numpy.select([numpy.greater(N_c/A, -c*abs(M)/(W_el*h)),True], [(-c*abs(M)/(W_el*h) + N_c/A)/(c*abs(M)/(W_el*h) + N_c/A),-1], default=numpy.nan)


def _069e4d3cd77d05aed615(n_y, k_yz, M_z_Ed, M_z_Rk, gamma_M1):
    # EN 1993-1-1 Eq. (6.61): Bending about z-z and axial compression, buckling about y-y
    return n_y + gamma_M1*k_yz*abs(M_z_Ed)/M_z_Rk


def _06a2360bfd1de0ee22b6(A_m, t, tau_Rd):
    # EN 1993-1-1 6.2.7(1), (5), Eq. (6.23): Torsional resistance, closed section
    return 2*A_m*t*tau_Rd


def _0839fff909ccaabe4193(d, t_f):
    # AISC 360-22 Section F2.2: Distance between flange centroids, ho = d − tf
    return d - t_f


def _086ab2f9163d829e242f(E, F_y):
    # AISC 360-22 Table B4.1b Case 15: Limit λr, web of a doubly symmetric I-shape, flexure
    return 5.7*numpy.sqrt(E/F_y)


def _095dc1363414c6727ceb(lam_r, lam, F_y):
    # AISC 360-22 Eq. E7-5, Table E7.1 case (a): Elastic local buckling stress, stiffened elements except walls of square and rectangular HSS (c2 = 1.31)
    return 1.7161*F_y*lam_r**2/lam**2


def _0d139d9445353a67bbb9(k_zz, section_class):
    # EN 1993-1-1 Annex B, Table B.1: Interaction factor k_yz
    return numpy.select([numpy.less_equal(section_class, 2),True], [0.6*k_zz,k_zz], default=numpy.nan)


def _0d48632a2ae683840ed3(E, nu):
    # EN 1993-1-1 3.2.6(1): Shear modulus
    return E/(2*nu + 2)


def _0ef822dbee9a4e6e5af3(W_pl, W_el, f_y, gamma_M0, section_class):
    # EN 1993-1-1 Eq. (6.13), (6.14): Bending resistance for the section class
    return numpy.select([numpy.less_equal(section_class, 2),numpy.less_equal(section_class, 3)], [W_pl*f_y/gamma_M0,W_el*f_y/gamma_M0], default=numpy.nan)


def _11c913d3ba6c08a6f16f(C_b, E, L_b, r_ts, J, c, S_x, h_o):
    # AISC 360-22 Eq. F2-4: Critical stress for lateral-torsional buckling
    return numpy.pi**2*C_b*E*r_ts**2*numpy.sqrt(0.078*J*L_b**2*c/(S_x*h_o*r_ts**2) + 1)/L_b**2


def _1226452d5ae3a903cf87(M_y):
    # AISC 360-22 Eq. F10-1: Nominal flexural strength, yielding
    return 1.5*M_y


def _123963307ea8562b93d3(Phi_LT, lambda_LT):
    # EN 1993-1-1 Eq. (6.56): Reduction factor for lateral-torsional buckling, general
    return functools.reduce(numpy.minimum, [1, (Phi_LT + numpy.sqrt(Phi_LT**2 - lambda_LT**2))**(-1.0)])


def _13aaf77b4ecc4782305d(E, L, D, D_t):
    # AISC 360-22 Eq. H3-2a: Torsional buckling stress of a round HSS, length-dependent
    return 1.23*E/(D_t**(5/4)*numpy.sqrt(L/D))


def _13ef280319349a572351(eps):
    # EN 1993-1-1 Table 5.2 (sheet 2): Class 2 limit of an outstand in compression
    return 10*eps


def _1439263560bd3f059103(lam_r, lam, F_y):
    # AISC 360-22 Eq. E7-5, Table E7.1 case (b): Elastic local buckling stress, walls of square and rectangular HSS (c2 = 1.38)
    return 1.9044*F_y*lam_r**2/lam**2


def _15f142db5f16997c16d9(F_y, F_e):
    # AISC 360-22 Eq. E3-2, E3-3: Critical stress for flexural buckling
    return numpy.select([numpy.less_equal(F_y/F_e, 2.25),True], [0.658**(F_y/F_e)*F_y,0.877*F_e], default=numpy.nan)


def _1681a6181b3cd6598ac1(F_u, A_e):
    # AISC 360-22 Eq. D2-2: Nominal tensile strength, rupture in the net section
    return A_e*F_u


def _1d8bfc7916147fe794e4(eps, alpha):
    # EN 1993-1-1 Table 5.2 (sheet 1): Class 2 limit of an internal part
    return numpy.select([numpy.greater(alpha, 0.5),True], [456*eps/(13*alpha - 1),41.5*eps/alpha], default=numpy.nan)


def _215e871c3b9f9a9561db(I_y, C_w, S_x):
    # AISC 360-22 Eq. F2-7: Effective radius of gyration
    return numpy.sqrt(numpy.sqrt(C_w*I_y)/S_x)


def _218fcbcaf3f8ead15ba8(b, lam, lam_r, F_y, F_cr, F_el):
    # AISC 360-22 Eq. E7-2, E7-3, Table E7.1 case (b): Effective width, walls of square and rectangular HSS (c1 = 0.2)
    return numpy.select([numpy.less_equal(lam, lam_r*numpy.sqrt(F_y/F_cr)),True], [b,b*numpy.sqrt(F_el/F_cr)*(1 - 0.2*numpy.sqrt(F_el/F_cr))], default=numpy.nan)


def _21f8d3b1de72b1f48061(eps):
    # EN 1993-1-1 Table 5.2 (sheet 1): Class 2 limit of an internal part in compression
    return 38*eps


def _23b3e31a231be6b34c0c(A_net, f_u, gamma_M2):
    # EN 1993-1-1 Eq. (6.7): Ultimate resistance of the net section
    return 0.9*A_net*f_u/gamma_M2


def _24f86a2a37775dd2b3ad(k_c):
    # EN 1993-1-1 Annex A, Table A.2: Factor C1 = k_c⁻²
    return k_c**(-2.0)


def _2591b6c97a2e54900118(eps):
    # EN 1993-1-1 Table 5.2 (sheet 2): Class 1 limit of an outstand in compression
    return 9*eps


def _27522fc680246d1a9232(b, t):
    # AISC 360-22 Section B4.1: Width-to-thickness ratio
    return b/t


def _2910791acf975b049344(F_cr, C):
    # AISC 360-22 Eq. H3-1: Nominal torsional strength of an HSS
    return C*F_cr


def _2b82d3179344a75017b7(A_g, h, h_e, b, b_e, t):
    # AISC 360-22 Section E7.1: Effective area: Ag less the ineffective widths
    return A_g - t*(2*b - 2*b_e) - t*(2*h - 2*h_e)


def _2b99b3f4bea66a8ae504(Phi_LT, lambda_LT, beta):
    # EN 1993-1-1 Eq. (6.57): Reduction factor for lateral-torsional buckling, rolled
    return functools.reduce(numpy.minimum, [1, lambda_LT**(-2.0), (Phi_LT + numpy.sqrt(Phi_LT**2 - beta*lambda_LT**2))**(-1.0)])


def _2cacbdee24ad514d39f1(D, t):
    # AISC 360-22 Section H3.1, User Note: Torsional constant of a round HSS
    return (1/2)*numpy.pi*t*(D - t)**2


def _2d02a653481b5f241f7d(A, b, t_f, t_w, r, h_w, eta):
    # EN 1993-1-1 6.2.6(3)a: Shear area of a rolled I-section, load parallel to the web
    return functools.reduce(numpy.maximum, [eta*h_w*t_w, A - 2*b*t_f + t_f*(2*r + t_w)])


def _31cdcda6dcc19c4a3227(h_tw, k_v, E, F_y):
    # AISC 360-22 Eq. G2-9, G2-10, G2-11: Web shear buckling coefficient
    return numpy.select([numpy.less_equal(h_tw, 1.1*numpy.sqrt(E*k_v/F_y)),numpy.less_equal(h_tw, 1.37*numpy.sqrt(E*k_v/F_y)),True], [1,1.1*numpy.sqrt(E*k_v/F_y)/h_tw,1.51*E*k_v/(F_y*h_tw**2)], default=numpy.nan)


def _336f85ec8d5a1f26a81e(eps):
    # EN 1993-1-1 Table 5.2 (sheet 3): Class 1 limit of a tube, d/t ≤ 50ε²
    return 50*eps**2


def _343b7ece5a462d0489a1(k_c, lambda_LT):
    # EN 1993-1-1 6.3.2.3(2): Modification factor f for the moment distribution
    return functools.reduce(numpy.minimum, [1, -1/2*(1 - k_c)*(1 - 2*(lambda_LT - 0.8)**2) + 1])


def _347d64da819a5807c838(M_pl_y_Rd, n, a):
    # EN 1993-1-1 Eq. (6.36): Reduced major-axis plastic moment of an I-section
    return functools.reduce(numpy.minimum, [M_pl_y_Rd, M_pl_y_Rd*(1 - n)/(1 - 1/2*a)])


def _34a384cad20da7fa7fc6(sigma_x, tau, f_y, gamma_M0):
    # EN 1993-1-1 Eq. (6.1): Yield criterion at a point of a member (σz = 0)
    return gamma_M0**2*sigma_x**2/f_y**2 + 3*gamma_M0**2*tau**2/f_y**2


def _3531dc15afa1c3c380c1(F_y):
    # AISC 360-22 Eq. H3-8: Nominal stress, shear yielding
    return 0.6*F_y


def _35be6253a3612eaaede0(E, F_y, L_v, D, D_t):
    # AISC 360-22 Eq. G5-2a, G5-2b: Shear critical stress of a round HSS
    return functools.reduce(numpy.minimum, [0.6*F_y, functools.reduce(numpy.maximum, [0.78*E/D_t**(3/2), 1.6*E/(D_t**(5/4)*numpy.sqrt(L_v/D))])])


def _360a3ce6dc79299771c7(E, L_c, r):
    # AISC 360-22 Eq. E3-4: Elastic buckling stress
    return numpy.pi**2*E*r**2/L_c**2


def _362d849919d4749b52ca(W_pl, W_el, f_y, section_class):
    # EN 1993-1-1 Table 6.7: Characteristic moment resistance
    return numpy.select([numpy.less_equal(section_class, 2),numpy.less_equal(section_class, 3)], [W_pl*f_y,W_el*f_y], default=numpy.nan)


def _3a12862e9a711196a587(psi, r):
    # EN 1993-1-1 Annex A, Table A.2: C_mi,0 for end moments (ψ) or a uniform moment (ψ = 1)
    return 0.21*psi + r*(0.36*psi - 0.1188) + 0.79


def _3a3fe7cc1dbd0f233257(E, F_y):
    # AISC 360-22 Table B4.1b Case 19: Limit λp, web of a rectangular HSS, flexure
    return 2.42*numpy.sqrt(E/F_y)


def _3dd3202a8c28b52cb272(E, F_y):
    # AISC 360-22 Table B4.1b Case 17: Limit λp, flange of a rectangular HSS, flexure
    return 1.12*numpy.sqrt(E/F_y)


def _3e6240a336d5a5b6112e(f_a, F_ca, f_b, F_cb):
    # AISC 360-22 Section H3.3(c), Eq. H3-9: Buckling under the compressive normal stress
    return f_b/F_cb + f_a/F_ca


def _3fb4ae6c2547534b9412(E, F_y):
    # AISC 360-22 Section G2.1(a): Web slenderness limit for φv = 1.00 (rolled I-shapes)
    return 2.24*numpy.sqrt(E/F_y)


def _43e583211c0b74309c01(E, F_y):
    # AISC 360-22 Table B4.1b Case 10: Limit λp, flange of a rolled I-shape, flexure
    return 0.38*numpy.sqrt(E/F_y)


def _4406c4c7f0c37849579c(a_LT, lambda_0, lambda_z, M_y_Ed, C_my, chi_LT, M_pl_y_Rd, M_z_Ed, C_mz, M_pl_z_Rd):
    # EN 1993-1-1 Annex A, Table A.1: Auxiliary term d_LT
    return 2*a_LT*lambda_0*abs(M_y_Ed)*abs(M_z_Ed)/(C_my*C_mz*M_pl_y_Rd*M_pl_z_Rd*chi_LT*(lambda_z**4 + 0.1))


def _44437356c4f5d32105c7(E, F_y):
    # AISC 360-22 Table B4.1b Case 12: Limit λp, leg of a single angle, flexure
    return 0.54*numpy.sqrt(E/F_y)


def _45a9555bfde48a4ebac2(lam_r, lam, F_y):
    # AISC 360-22 Eq. E7-5, Table E7.1 case (c): Elastic local buckling stress, all other elements (c2 = 1.49)
    return 2.2201*F_y*lam_r**2/lam**2


def _466e1ff29c4bad9f8e26(eps):
    # EN 1993-1-1 Table 5.2 (sheet 2): Class 3 limit of an outstand in compression
    return 14*eps


def _468d5b94783a5c147e02(A_g, h, h_e, t_w, b, b_e, t_f):
    # AISC 360-22 Section E7.1: Effective area: Ag less the ineffective widths
    return A_g - t_f*(4*b - 4*b_e) - t_w*(h - h_e)


def _4784815596a3f7bac197(eps, psi):
    # EN 1993-1-1 Table 5.2 (sheet 1): Class 3 limit of an internal part
    return numpy.select([numpy.greater(psi, -1),True], [42*eps/(0.33*psi + 0.67),62*eps*numpy.sqrt(-psi)*(1 - psi)], default=numpy.nan)


def _4889372fd95577256d94(C_mz, mu_z, r_z, C_zz, section_class):
    # EN 1993-1-1 Annex A, Table A.1: Interaction factor k_zz (Method 1)
    return numpy.select([numpy.less_equal(section_class, 2),True], [C_mz*mu_z/(C_zz*(1 - r_z)),C_mz*mu_z/(1 - r_z)], default=numpy.nan)


def _49f3f66d56fc53a12c4e(alpha_LT, lambda_LT):
    # EN 1993-1-1 6.3.2.2(1): Value to determine χ_LT, general case
    return (1/2)*alpha_LT*(lambda_LT - 0.2) + (1/2)*lambda_LT**2 + 1/2


def _4b93d3f7880dc7f94e01(E, F_y, D_t, Z, S):
    # AISC 360-22 Eq. F8-1, F8-2, F8-3, F8-4: Nominal flexural strength, round HSS
    return numpy.select([numpy.less_equal(D_t, 0.07*E/F_y),numpy.less_equal(D_t, 0.31*E/F_y),True], [F_y*Z,S*(F_y + 0.021*E/D_t),0.33*E*S/D_t], default=numpy.nan)


def _4d5e37c65134456daf08(Phi, lambda_rel):
    # EN 1993-1-1 Eq. (6.49): Reduction factor for flexural buckling
    return functools.reduce(numpy.minimum, [1, (Phi + numpy.sqrt(Phi**2 - lambda_rel**2))**(-1.0)])


def _4e6d474011dcfd1f3428(F_y, b_f, t_f, C_v2):
    # AISC 360-22 Eq. G6-1: Nominal weak-axis shear strength, both flanges
    return 1.2*C_v2*F_y*b_f*t_f


def _5132d068284fa6fc3913(M_p, C_b, F_y, S_x, L_b, L_p, L_r, F_cr):
    # AISC 360-22 Eq. F2-1, F2-2, F2-3: Nominal flexural strength, yielding and LTB
    return numpy.select([numpy.less_equal(L_b, L_p),numpy.less_equal(L_b, L_r),True], [M_p,functools.reduce(numpy.minimum, [M_p, C_b*(M_p - (L_b - L_p)*(-0.7*F_y*S_x + M_p)/(-L_p + L_r))]),functools.reduce(numpy.minimum, [M_p, F_cr*S_x])], default=numpy.nan)


def _515b0aec15468072be21(f_235, f_y):
    # EN 1993-1-1 Table 5.2: ε = √(235/f_y)
    return numpy.sqrt(f_235/f_y)


def _547046bc175cd02c08d0(d, k_des):
    # AISC 360-22 Section B4.1b: Web height, h = d − 2·k_des (rolled shape, fillets excluded)
    return d - 2*k_des


def _547eb829b8d846322511(A, h, t):
    # EN 1993-1-1 6.2.9.1(5): Flange area ratio a_f of an RHS
    return functools.reduce(numpy.minimum, [0.5, (A - 2*h*t)/A])


def _555999658d56a35ed6cb(M_p, F_y, S, lam_w, E):
    # AISC 360-22 Eq. F7-6: Nominal flexural strength, web local buckling
    return functools.reduce(numpy.minimum, [M_p, M_p - (-F_y*S + M_p)*(0.305*lam_w*numpy.sqrt(F_y/E) - 0.738)])


def _57bb8f8297635007d9b2(E, r_y, J, A_g, M_p):
    # AISC 360-22 Eq. F7-12: Limiting laterally unbraced length for yielding
    return 0.13*E*r_y*numpy.sqrt(A_g*J)/M_p


def _58f8cd2ce20ebb53188d(E, F_y):
    # AISC 360-22 Table B4.1a Case 3: Limit λr, leg of a single angle, axial compression
    return 0.45*numpy.sqrt(E/F_y)


def _5dbf5128df6ef63fee29(W_y, f_y, M_cr):
    # EN 1993-1-1 6.3.2.2(1): Non-dimensional slenderness for lateral-torsional buckling
    return numpy.sqrt(W_y*f_y/M_cr)


def _5e91245b7b98f766f926(F_y, A_w, C_v2):
    # AISC 360-22 Eq. G4-1: Nominal shear strength of a rectangular HSS
    return 0.6*A_w*C_v2*F_y


def _60076b235db70a7c438f(I, A, H, t, b, b_e):
    # AISC 360-22 Section F7.2(c): Effective section modulus: elastic, without b − be of the compression flange
    return (-A*t*((1/2)*H - 1/2*t)**2*(b - b_e)/(A - t*(b - b_e)) + I)/((1/2)*H + t*((1/2)*H - 1/2*t)*(b - b_e)/(A - t*(b - b_e)))


def _61033bf8d0814c6623c0(b, lam, lam_r, F_y, F_cr, F_el):
    # AISC 360-22 Eq. E7-2, E7-3, Table E7.1 case (c): Effective width, all other elements (c1 = 0.22)
    return numpy.select([numpy.less_equal(lam, lam_r*numpy.sqrt(F_y/F_cr)),True], [b,b*numpy.sqrt(F_el/F_cr)*(1 - 0.22*numpy.sqrt(F_el/F_cr))], default=numpy.nan)


def _6179be05e9d32de4185a(A, f_y, N_cr):
    # EN 1993-1-1 Eq. (6.50): Non-dimensional slenderness
    return numpy.sqrt(A*f_y/N_cr)


def _62b2c72e231a54c2cdd9(A, b, t_f):
    # EN 1993-1-1 6.2.9.1(5): Web area ratio a of an I-section
    return functools.reduce(numpy.minimum, [0.5, (A - 2*b*t_f)/A])


def _64df9f199da5f9f4d2bf(tau_t, tau_Rd, V_pl_Rd):
    # EN 1993-1-1 6.2.7(9), Eq. (6.26): Plastic shear resistance with torsion, I or H
    return V_pl_Rd*numpy.sqrt(functools.reduce(numpy.maximum, [0, 1 - 0.8*tau_t/tau_Rd]))


def _66bb4027d1e4439220ca(A):
    # EN 1993-1-1 6.2.6(3)g: Shear area of a CHS of uniform thickness
    return 2*A/numpy.pi


def _6916531ac6c696cb24a9(eps, eta):
    # EN 1993-1-1 6.2.6(6): Web slenderness limit without shear buckling check
    return 72*eps/eta


def _693b6aa468da87845f2e(n, section_class):
    # EN 1993-1-1 6.2.9.1(6): Exponents α = β of the biaxial criterion, RHS
    return numpy.select([numpy.greater(section_class, 2),numpy.less_equal(n, 0.8),True], [1,functools.reduce(numpy.minimum, [6, 1.66/(1 - 1.13*n**2)]),6], default=numpy.nan)


def _6944a5828cc6dd0cc29a(C_my, a_LT, lambda_0, lambda_0_lim, r_z, r_T):
    # EN 1993-1-1 Annex A, Table A.2: Equivalent uniform moment factor C_mLT
    return numpy.select([numpy.less_equal(lambda_0, lambda_0_lim),numpy.greater((1 - r_T)*(1 - r_z), 0),True], [1,functools.reduce(numpy.maximum, [1, C_my**2*a_LT/numpy.sqrt((1 - r_T)*(1 - r_z))]),1], default=numpy.nan)


def _6aa5c1f5250fea7df1a9(N_Ed, N_Rd, M_y_Ed, M_y_Rd, M_z_Ed, M_z_Rd):
    # EN 1993-1-1 Eq. (6.2): Linear interaction of axial force and bending
    return abs(N_Ed)/N_Rd + abs(M_z_Ed)/M_z_Rd + abs(M_y_Ed)/M_y_Rd


def _6af3b4022b88243288ee(n, section_class):
    # EN 1993-1-1 6.2.9.1(6): Exponent β of the biaxial criterion, I-section
    return numpy.select([numpy.less_equal(section_class, 2),True], [functools.reduce(numpy.maximum, [1, 5*n]),1], default=numpy.nan)


def _6b2ee64c2b878b38fb61(A, h_load, h_other):
    # EN 1993-1-1 6.2.6(3)f: Shear area of an RHS of uniform thickness
    return A*h_load/(h_load + h_other)


def _6b6def47ce058e80922e(E, F_y):
    # AISC 360-22 Table B4.1b Case 20: Limit λp, round HSS, flexure
    return 0.07*E/F_y


def _6ceeac84a61bf70ffb70(n_z, k_zz, M_z_Ed, M_z_Rk, gamma_M1):
    # EN 1993-1-1 Eq. (6.62): Bending about z-z and axial compression, buckling about z-z
    return n_z + gamma_M1*k_zz*abs(M_z_Ed)/M_z_Rk


def _6f4216d75cf039ef8c09(M_y, M_cr):
    # AISC 360-22 Eq. F10-2, F10-3: Nominal flexural strength, lateral-torsional buckling
    return numpy.select([numpy.less_equal(M_y/M_cr, 1),True], [functools.reduce(numpy.minimum, [1.5*M_y, M_y*(1.92 - 1.17*numpy.sqrt(M_y/M_cr))]),M_cr*(-0.17*M_cr/M_y + 0.92)], default=numpy.nan)


def _705d1c3ce35be1cfc4ca(C_mz, mu_y, r_z, C_yz, w_z, w_y, section_class):
    # EN 1993-1-1 Annex A, Table A.1: Interaction factor k_yz (Method 1)
    return numpy.select([numpy.less_equal(section_class, 2),True], [0.6*C_mz*mu_y*numpy.sqrt(w_z/w_y)/(C_yz*(1 - r_z)),C_mz*mu_y/(1 - r_z)], default=numpy.nan)


def _709b39a9e897d31a3654(r_y, E, F_y):
    # AISC 360-22 Eq. F2-5: Limiting laterally unbraced length for yielding
    return 1.76*r_y*numpy.sqrt(E/F_y)


def _7444a196e0c28f2aab0e(N_Ed, A, M_y_Ed, W_el_y, M_z_Ed, W_el_z):
    # EN 1993-1-1 6.2.9.2(1), Eq. (6.42): Largest longitudinal stress, elastic
    return abs(M_z_Ed)/W_el_z + abs(M_y_Ed)/W_el_y + abs(N_Ed)/A


def _74ecd0f3e35b26b8f66a(outside, t):
    # AISC 360-22 Section B4.1b: Flat width of an HSS wall, outside dimension less 3t
    return outside - 3*t


def _759f4c42562f49eb798d(w_y, C_my, lambda_max, n_pl, b_LT, W_el_y, W_pl_y):
    # EN 1993-1-1 Annex A, Table A.1: Auxiliary term C_yy
    return functools.reduce(numpy.maximum, [W_el_y/W_pl_y, (-b_LT + n_pl*(-1.6*C_my**2*lambda_max**2/w_y - 1.6*C_my**2*lambda_max/w_y + 2))*(w_y - 1) + 1])


def _7673888dbae4f34b7089(M_p, F_y, S_x, lam, lam_pf, lam_rf, E, k_c):
    # AISC 360-22 Eq. F3-1, F3-2: Nominal flexural strength, flange local buckling
    return numpy.select([numpy.less_equal(lam, lam_rf),True], [M_p - (lam - lam_pf)*(-0.7*F_y*S_x + M_p)/(-lam_pf + lam_rf),0.9*E*S_x*k_c/lam**2], default=numpy.nan)


def _770850eca8da6495e97c(F_cr, A_g):
    # AISC 360-22 Eq. E3-1: Nominal compressive strength, flexural buckling
    return A_g*F_cr


def _77f20c75cb8dd5a3f922(E_I, K, L):
    # AISC 360-22 Eq. A-8-5: Elastic critical buckling strength in the plane of bending
    return numpy.pi**2*E_I/(K**2*L**2)


def _7b5a09dd4e484fe07baf(N_Ed, N_cr):
    # EN 1993-1-1 Annex A, Table A.1: Critical force ratio r = N_Ed/N_cr
    return N_Ed/N_cr


def _7b94e6b1d46ab495aec2(w_z, w_y, C_mz, lambda_max, n_pl, c_LT, W_el_z, W_pl_z):
    # EN 1993-1-1 Annex A, Table A.1: Auxiliary term C_yz
    return functools.reduce(numpy.maximum, [0.6*W_el_z*numpy.sqrt(w_z/w_y)/W_pl_z, (-c_LT + n_pl*(-14*C_mz**2*lambda_max**2/w_z**5 + 2))*(w_z - 1) + 1])


def _7beaf44b036bf7c0a6b6(alpha, lambda_rel):
    # EN 1993-1-1 6.3.1.2(1): Value to determine the reduction factor χ
    return (1/2)*alpha*(lambda_rel - 0.2) + (1/2)*lambda_rel**2 + 1/2


def _7f0ad753675816955567(b, lam, lam_r, F_y, F_cr, F_el):
    # AISC 360-22 Eq. E7-2, E7-3, Table E7.1 case (a): Effective width, stiffened elements except walls of square and rectangular HSS (c1 = 0.18)
    return numpy.select([numpy.less_equal(lam, lam_r*numpy.sqrt(F_y/F_cr)),True], [b,b*numpy.sqrt(F_el/F_cr)*(1 - 0.18*numpy.sqrt(F_el/F_cr))], default=numpy.nan)


def _83735bc998e3f9032378(n_z, k_zy, M_y_Ed, chi_LT, M_y_Rk, gamma_M1):
    # EN 1993-1-1 Eq. (6.62): Bending about y-y and axial compression, buckling about z-z
    return n_z + gamma_M1*k_zy*abs(M_y_Ed)/(M_y_Rk*chi_LT)


def _8941ba3018d7c4da8efa(eps):
    # EN 1993-1-1 Table 5.2 (sheet 1): Class 1 limit of an internal part in compression
    return 33*eps


def _8cb77420f6b79da407bf(N_Ed, A, f_y, gamma_M1):
    # EN 1993-1-1 Annex A, Table A.1: Auxiliary term n_pl
    return N_Ed*gamma_M1/(A*f_y)


def _8cc19139d286c3e0d3c2(eps):
    # EN 1993-1-1 Table 5.2 (sheet 3): Class 3 limit of a tube, d/t ≤ 90ε²
    return 90*eps**2


def _8e668b6cdfc43e3298c0(C_my, lambda_y, n_y, section_class):
    # EN 1993-1-1 Annex B, Table B.1: Interaction factor k_yy
    return numpy.select([numpy.less_equal(section_class, 2),True], [C_my*functools.reduce(numpy.minimum, [0.8*n_y + 1, n_y*(lambda_y - 0.2) + 1]),C_my*functools.reduce(numpy.minimum, [0.6*n_y + 1, 0.6*lambda_y*n_y + 1])], default=numpy.nan)


def _8ff5794b5c1fb26fd139(E, F_y):
    # AISC 360-22 Table B4.1a Case 6: Limit λr, wall of a rectangular HSS, axial compression
    return 1.4*numpy.sqrt(E/F_y)


def _906cc9b7326bd407e2a2(rho, f_y):
    # EN 1993-1-1 6.2.8(3): Yield strength reduced for shear
    return f_y*(1 - rho)


def _92199254275541027b3b(K, L):
    # AISC 360-22 Section E2: Effective length, Lc = K·L
    return K*L


def _987ae3cf58517372f266(N_Ed, A, M_Ed, W_el):
    # EN 1993-1-1 6.2.9.2(1), Eq. (6.42): Largest longitudinal stress, elastic
    return abs(M_Ed)/W_el + abs(N_Ed)/A


def _997ab3fe735748908034(h, t):
    # AISC 360-22 Section G4: Shear area of a rectangular HSS, Aw = 2·h·t
    return 2*h*t


def _9b9bd93673a09d933586(eps, alpha):
    # EN 1993-1-1 Table 5.2 (sheet 1): Class 1 limit of an internal part
    return numpy.select([numpy.greater(alpha, 0.5),True], [396*eps/(13*alpha - 1),36*eps/alpha], default=numpy.nan)


def _9e2817142db9818ebb5d(a_LT, lambda_0, M_y_Ed, chi_LT, M_pl_y_Rd, M_z_Ed, M_pl_z_Rd):
    # EN 1993-1-1 Annex A, Table A.1: Auxiliary term b_LT
    return (1/2)*a_LT*lambda_0**2*abs(M_y_Ed)*abs(M_z_Ed)/(M_pl_y_Rd*M_pl_z_Rd*chi_LT)


def _a0259eb1464452636c95(E, D_t):
    # AISC 360-22 Eq. H3-2b: Torsional buckling stress of a round HSS
    return 0.6*E/D_t**(3/2)


def _a1d811c244c23a656593(M_p, F_y, S, lam, lam_rf, E, S_e):
    # AISC 360-22 Eq. F7-2, F7-3: Nominal flexural strength, flange local buckling
    return numpy.select([numpy.less_equal(lam, lam_rf),True], [functools.reduce(numpy.minimum, [M_p, M_p - (-F_y*S + M_p)*(3.57*lam*numpy.sqrt(F_y/E) - 4.0)]),F_y*S_e], default=numpy.nan)


def _a23b40a872992b706624(E, F_y):
    # AISC 360-22 Table B4.1a Case 9: Limit λr, round HSS, axial compression
    return 0.11*E/F_y


def _a46a8809267c7f4b3a3b(sigma_x, sigma_z, tau, f_y, gamma_M0):
    # EN 1993-1-1 Eq. (6.1): Yield criterion at a critical point
    return gamma_M0**2*sigma_x**2/f_y**2 - gamma_M0**2*sigma_x*sigma_z/f_y**2 + gamma_M0**2*sigma_z**2/f_y**2 + 3*gamma_M0**2*tau**2/f_y**2


def _a4dd29e038d0bb5848b9(F_cr, A_e):
    # AISC 360-22 Eq. E7-1: Nominal compressive strength, slender elements
    return A_e*F_cr


def _a52c8a43208c508b2c9d(C_1, C_2, z_g, E, I_z, I_w, G, I_t, L_LT):
    # NCCI SN003a-EN-EU (Access Steel), Elastic critical moment for lateral torsional buckling: three-factor formula, k = k_w: Elastic critical moment for lateral-torsional buckling
    return numpy.pi**2*C_1*E*I_z*(-C_2*z_g + numpy.sqrt(C_2**2*z_g**2 + I_w/I_z + G*I_t*L_LT**2/(numpy.pi**2*E*I_z)))/L_LT**2


def _a661bc4a59d8174df986(E, C_w, L_cz, G, J, I_x, I_y):
    # AISC 360-22 Eq. E4-2: Elastic torsional buckling stress, doubly symmetric member
    return (numpy.pi**2*C_w*E/L_cz**2 + G*J)/(I_x + I_y)


def _a6fd63aa0f785d4a2fe7(M_p, C_b, F_y, S_x, L_b, L_p, L_r, E, J, A_g, r_y):
    # AISC 360-22 Eq. F7-10, F7-11: Nominal flexural strength, lateral-torsional buckling
    return numpy.select([numpy.less_equal(L_b, L_p),numpy.less_equal(L_b, L_r),True], [M_p,functools.reduce(numpy.minimum, [M_p, C_b*(M_p - (L_b - L_p)*(-0.7*F_y*S_x + M_p)/(-L_p + L_r))]),functools.reduce(numpy.minimum, [M_p, 2*C_b*E*r_y*numpy.sqrt(A_g*J)/L_b])], default=numpy.nan)


def _a7577ca2a7988b0f4528(M_pl_z_Rd, n, a):
    # EN 1993-1-1 Eq. (6.37), (6.38): Reduced minor-axis plastic moment of an I-section
    return numpy.select([numpy.greater_equal(a, n),True], [M_pl_z_Rd,M_pl_z_Rd*(1 - (-a + n)**2/(1 - a)**2)], default=numpy.nan)


def _a8860c685b53af0d20b1(M_y_Ed, M_N_y_Rd, M_z_Ed, M_N_z_Rd, alpha, beta):
    # EN 1993-1-1 Eq. (6.41): Bi-axial bending with axial force
    return (abs(M_y_Ed)/M_N_y_Rd)**alpha + (abs(M_z_Ed)/M_N_z_Rd)**beta


def _a8daed80b44009104e72(E, r_y, J, A_g, F_y, S_x):
    # AISC 360-22 Eq. F7-13: Limiting laterally unbraced length for inelastic LTB
    return 2.85714285714286*E*r_y*numpy.sqrt(A_g*J)/(F_y*S_x)


def _aa29a9e86ac8598d7feb(A, b, t):
    # EN 1993-1-1 6.2.9.1(5): Web area ratio a_w of an RHS
    return functools.reduce(numpy.minimum, [0.5, (A - 2*b*t)/A])


def _ac61001bff5ddfb4353c(C_my, C_mLT, mu_z, r_y, C_zy, w_y, w_z, section_class):
    # EN 1993-1-1 Annex A, Table A.1: Interaction factor k_zy (Method 1)
    return numpy.select([numpy.less_equal(section_class, 2),True], [0.6*C_mLT*C_my*mu_z*numpy.sqrt(w_y/w_z)/(C_zy*(1 - r_y)),C_mLT*C_my*mu_z/(1 - r_y)], default=numpy.nan)


def _acb9fcfde25855bca109(E, F_y, D_t, A_g):
    # AISC 360-22 Eq. E7-6: Effective area of a round HSS
    return numpy.select([numpy.less_equal(D_t, 0.11*E/F_y),True], [A_g,A_g*(2/3 + 0.038*E/(D_t*F_y))], default=numpy.nan)


def _acd522560216e9a8e5a2(F_y, A_w, C_v1):
    # AISC 360-22 Eq. G2-1: Nominal shear strength
    return 0.6*A_w*C_v1*F_y


def _ad1124a63ccf9db69b73(E, I_z, I_w, G, I_t, L_LT):
    # EN 1993-1-1 Annex A, Table A.2: Elastic critical moment under uniform moment (for λ̄_0)
    return numpy.pi**2*E*I_z*numpy.sqrt(I_w/I_z + G*I_t*L_LT**2/(numpy.pi**2*E*I_z))/L_LT**2


def _ada8a6e7d995f3b785a2(M_pl_Rd, n, a):
    # EN 1993-1-1 Eq. (6.39), (6.40): Reduced plastic moment of an RHS
    return functools.reduce(numpy.minimum, [M_pl_Rd, M_pl_Rd*(1 - n)/(1 - 1/2*a)])


def _adeba23d3423b09471da(a_LT, lambda_0, lambda_z, M_y_Ed, C_my, chi_LT, M_pl_y_Rd):
    # EN 1993-1-1 Annex A, Table A.1: Auxiliary term e_LT
    return 1.7*a_LT*lambda_0*abs(M_y_Ed)/(C_my*M_pl_y_Rd*chi_LT*(lambda_z**4 + 0.1))


def _ae71aaa64bbb7c595492(eps):
    # EN 1993-1-1 Table 5.2 (sheet 3): Class 2 limit of a tube, d/t ≤ 70ε²
    return 70*eps**2


def _aed897c6603e1a9b5064(C_mLT, lambda_z, n_z, section_class):
    # EN 1993-1-1 Annex B, Table B.2: Interaction factor k_zy, torsional deformation
    return numpy.select([numpy.greater(section_class, 2),numpy.less(lambda_z, 0.4),True], [functools.reduce(numpy.maximum, [-0.05*n_z/(C_mLT - 0.25) + 1, -0.05*lambda_z*n_z/(C_mLT - 0.25) + 1]),functools.reduce(numpy.minimum, [lambda_z + 0.6, -0.1*lambda_z*n_z/(C_mLT - 0.25) + 1]),functools.reduce(numpy.maximum, [-0.1*n_z/(C_mLT - 0.25) + 1, -0.1*lambda_z*n_z/(C_mLT - 0.25) + 1])], default=numpy.nan)


def _af8934e238e12ca5aace(F_y, Z):
    # AISC 360-22 Eq. F2-1: Plastic moment
    return F_y*Z


def _af9849b67255cd834e28(C_1, r_z, r_T):
    # EN 1993-1-1 Annex A, Table A.2: Slenderness limit of λ̄_0 below which torsion is not considered
    return 0.2*numpy.sqrt(C_1)*functools.reduce(numpy.maximum, [0, (1 - r_T)*(1 - r_z)])**0.25


def _b18a461b65e9665f3856(C_mz, lambda_z, n_z, section_class):
    # EN 1993-1-1 Annex B, Table B.1: Interaction factor k_zz, hollow section
    return numpy.select([numpy.less_equal(section_class, 2),True], [C_mz*functools.reduce(numpy.minimum, [0.8*n_z + 1, n_z*(lambda_z - 0.2) + 1]),C_mz*functools.reduce(numpy.minimum, [0.6*n_z + 1, 0.6*lambda_z*n_z + 1])], default=numpy.nan)


def _b1dde4caf1a28f0f0d9e(A_g, b_1, b_e1, b_2, b_e2, t):
    # AISC 360-22 Section E7.1: Effective area: Ag less the ineffective widths
    return A_g - t*(b_1 - b_e1) - t*(b_2 - b_e2)


def _b26d990aa331a1150fd8(F_y, S_c, lam, lam_r, E):
    # AISC 360-22 Eq. F10-6, F10-7, F10-8: Nominal flexural strength, leg local buckling
    return numpy.select([numpy.less_equal(lam, lam_r),True], [F_y*S_c*(-1.72*lam*numpy.sqrt(F_y/E) + 2.43),0.71*E*S_c/lam**2], default=numpy.nan)


def _b3c7f45661e0b04d42c4(chi, A, f_y, gamma_M1):
    # EN 1993-1-1 Eq. (6.47): Buckling resistance of a compression member
    return A*chi*f_y/gamma_M1


def _b461767123fab5da53ca(P_r, P_c, M_rx, M_cx, M_ry, M_cy, v_ratio, T_r, T_c, eta_H1):
    # AISC 360-22 Eq. H3-6: Interaction of torsion, shear, flexure and axial force
    return numpy.select([numpy.greater(T_r, 0.2*T_c),True], [(v_ratio + T_r/T_c)**2 + P_r/P_c + M_ry/M_cy + M_rx/M_cx,eta_H1], default=numpy.nan)


def _b4b3cb4f99d908167488(E, F_y):
    # AISC 360-22 Table B4.1b Case 12: Limit λr, leg of a single angle, flexure
    return 0.91*numpy.sqrt(E/F_y)


def _b74aa1bdb1a71561356b(w_y, w_z, C_my, lambda_max, n_pl, d_LT, W_el_y, W_pl_y):
    # EN 1993-1-1 Annex A, Table A.1: Auxiliary term C_zy
    return functools.reduce(numpy.maximum, [0.6*W_el_y*numpy.sqrt(w_y/w_z)/W_pl_y, (-d_LT + n_pl*(-14*C_my**2*lambda_max**2/w_y**5 + 2))*(w_y - 1) + 1])


def _b800764b2b4f7e736507(a_LT, lambda_0, lambda_z, M_y_Ed, C_my, chi_LT, M_pl_y_Rd):
    # EN 1993-1-1 Annex A, Table A.1: Auxiliary term c_LT
    return 10*a_LT*lambda_0**2*abs(M_y_Ed)/(C_my*M_pl_y_Rd*chi_LT*(lambda_z**4 + 5))


def _b83ebeb6559328560261(N_c, f_y, c, t_total):
    # EN 1993-1-1 Table 5.2 (sheet 1): Compressed fraction α of an internal part at full plasticity
    return functools.reduce(numpy.minimum, [1, functools.reduce(numpy.maximum, [0.05, (1/2)*N_c/(c*f_y*t_total) + 1/2])])


def _b86f3872000aaaeb7ff8(T_t, t, I_t):
    # EN 1993-1-1 6.2.7(4): St Venant shear stress, open section
    return T_t*t/I_t


def _b941de2eb4708831fe61(I_t, I_y):
    # EN 1993-1-1 Annex A, Table A.1: Auxiliary term a_LT
    return functools.reduce(numpy.maximum, [0, -I_t/I_y + 1])


def _ba4c1eb426b844a00c0f(r, chi):
    # EN 1993-1-1 Annex A, Table A.1: Auxiliary term μ
    return (1 - r)/(-chi*r + 1)


def _ba60d3ef0bfee0b95f40(E, F_y):
    # AISC 360-22 Table B4.1b Case 20: Limit λr, round HSS, flexure
    return 0.31*E/F_y


def _bc0c5d3b767b25173efd(k_yy, section_class):
    # EN 1993-1-1 Annex B, Table B.1: Interaction factor k_zy, no torsional deformation
    return numpy.select([numpy.less_equal(section_class, 2),True], [0.6*k_yy,0.8*k_yy], default=numpy.nan)


def _bc9b2e2c73729b9b06e8(F_y, A_g):
    # AISC 360-22 Eq. D2-1: Nominal tensile strength, yielding in the gross section
    return A_g*F_y


def _bcf1509c586b11be2a3f(chi_LT, f, lambda_LT):
    # EN 1993-1-1 Eq. (6.58): Modified reduction factor for lateral-torsional buckling
    return functools.reduce(numpy.minimum, [1, lambda_LT**(-2.0), chi_LT/f])


def _c0b245bec74298f53be9(d, t):
    # EN 1993-1-1 6.2.7(4): Area enclosed by the mid-line of the wall, circular section
    return (1/4)*numpy.pi*(d - t)**2


def _c0d46e2aec8bb27ba4f4(alpha_LT, lambda_LT, lambda_LT_0, beta):
    # EN 1993-1-1 6.3.2.3(1): Value to determine χ_LT, rolled or equivalent welded
    return (1/2)*alpha_LT*(lambda_LT - lambda_LT_0) + (1/2)*beta*lambda_LT**2 + 1/2


def _c380faef19ad693e0db2(B, H, t):
    # AISC 360-22 Section H3.1, User Note: Torsional constant of a rectangular HSS
    return -t**3*(18.0 - 4.5*numpy.pi) + t*(2*B - 2*t)*(H - t)


def _c383e27d633b8a2fd2e1(G, I_t, E, I_w, L_T, i_y, i_z):
    # EN 1993-1-1 Annex A, Table A.1: Elastic torsional buckling force
    return (numpy.pi**2*E*I_w/L_T**2 + G*I_t)/(i_y**2 + i_z**2)


def _c4686c0f0c10319639ef(f_y, gamma_M0):
    # EN 1993-1-1 6.2.7(5), 6.2.1(5) Eq. (6.1): Design shear strength, yield criterion
    return (1/3)*numpy.sqrt(3)*f_y/gamma_M0


def _c5ec42bcf88fd4a4c228(L_c, r):
    # AISC 360-22 Section E2: Slenderness ratio
    return L_c/r


def _c65d60e151d3b34f26c1(C_my_0, lambda_0, lambda_0_lim, M_y_Ed, N_Ed, A, W_el_y, a_LT, r_y):
    # EN 1993-1-1 Annex A, Table A.2: Equivalent uniform moment factor C_my
    return numpy.select([numpy.less_equal(lambda_0, lambda_0_lim),numpy.less_equal(r_y, 0),True], [C_my_0,1,C_my_0 + a_LT*numpy.sqrt(A/(N_Ed*W_el_y))*(1 - C_my_0)*numpy.sqrt(abs(M_y_Ed))/(a_LT*numpy.sqrt(A/(N_Ed*W_el_y))*numpy.sqrt(abs(M_y_Ed)) + 1)], default=numpy.nan)


def _c6b9a3c1bc233218634d(t, E, F_y, lam, b):
    # AISC 360-22 Eq. F7-4: Effective width of the compression flange
    return functools.reduce(numpy.minimum, [b, 1.92*t*numpy.sqrt(E/F_y)*(1 - 0.38*numpy.sqrt(E/F_y)/lam)])


def _c7ec74e5824e3c89db9b(tau_t, tau_Rd, V_pl_Rd):
    # EN 1993-1-1 6.2.7(9), Eq. (6.28): Plastic shear resistance with torsion, hollow
    return V_pl_Rd*functools.reduce(numpy.maximum, [0, 1 - tau_t/tau_Rd])


def _c9321b59dafead64b748(A_v, f_y, gamma_M0):
    # EN 1993-1-1 Eq. (6.18): Plastic shear resistance
    return (1/3)*numpy.sqrt(3)*A_v*f_y/gamma_M0


def _cafc46190d87a4080415(W_pl_y, W_el_y, section_class):
    # EN 1993-1-1 6.3.2.2(1): Section modulus for lateral-torsional buckling
    return numpy.select([numpy.less_equal(section_class, 2),numpy.less_equal(section_class, 3)], [W_pl_y,W_el_y], default=numpy.nan)


def _ccbce2fc341bab48375d(h_tw, k_v, E, F_y):
    # AISC 360-22 Eq. G2-2, G2-3, G2-4: Web shear strength coefficient
    return numpy.select([numpy.less_equal(h_tw, 1.1*numpy.sqrt(E*k_v/F_y)),True], [1,1.1*numpy.sqrt(E*k_v/F_y)/h_tw], default=numpy.nan)


def _ccc0b0e200afd0c59bce(w_z, C_mz, lambda_max, n_pl, e_LT, W_el_z, W_pl_z):
    # EN 1993-1-1 Annex A, Table A.1: Auxiliary term C_zz
    return functools.reduce(numpy.maximum, [W_el_z/W_pl_z, (-e_LT + n_pl*(-1.6*C_mz**2*lambda_max**2/w_z - 1.6*C_mz**2*lambda_max/w_z + 2))*(w_z - 1) + 1])


def _ccc1468ea91a9d7409b9(N_Ed, chi, A, f_y, gamma_M1):
    # EN 1993-1-1 Eq. (6.61), (6.62): Axial force ratio for buckling, n = N_Ed/N_b,Rd
    return N_Ed*gamma_M1/(A*chi*f_y)


def _ce2c5756bd228041db56(chi_LT, W_y, f_y, gamma_M1):
    # EN 1993-1-1 Eq. (6.55): Design buckling resistance moment
    return W_y*chi_LT*f_y/gamma_M1


def _cf31d720b242fe13da62(V_rx, V_ry):
    # : Resultant shear (a round HSS resists shear alike in every direction)
    return numpy.sqrt(V_rx**2 + V_ry**2)


def _d0583cdfdac436eea4ce(A, f_y, gamma_M0):
    # EN 1993-1-1 Eq. (6.6), (6.10): Plastic resistance of the gross section
    return A*f_y/gamma_M0


def _d06027cd009b3c69ea06(n_z, k_zy, M_y_Ed, chi_LT, M_y_Rk, k_zz, M_z_Ed, M_z_Rk, gamma_M1):
    # EN 1993-1-1 Eq. (6.62): Bending and axial compression, buckling about z-z
    return n_z + gamma_M1*k_zz*abs(M_z_Ed)/M_z_Rk + gamma_M1*k_zy*abs(M_y_Ed)/(M_y_Rk*chi_LT)


def _d063fe98f6a4773bcaea(r_ts, E, F_y, J, c, S_x, h_o):
    # AISC 360-22 Eq. F2-6: Limiting unbraced length for inelastic LTB
    return 2.78571428571429*E*r_ts*numpy.sqrt(J*c/(S_x*h_o) + numpy.sqrt(J**2*c**2/(S_x**2*h_o**2) + 3.3124*F_y**2/E**2))/F_y


def _d0f17538c605a55fa899(E, F_y):
    # AISC 360-22 Table B4.1a Case 5: Limit λr, web of a doubly symmetric I-shape, axial compression
    return 1.49*numpy.sqrt(E/F_y)


def _d22d3001e283e3415b81(r):
    # EN 1993-1-1 Annex A, Table A.2: C_mi,0 for a uniform load
    return 1 - 0.18*r


def _d2e7c4af2b915f33f31c(T_t, A_m, t):
    # EN 1993-1-1 6.2.7(4), (7): St Venant shear stress, closed thin-walled section
    return (1/2)*T_t/(A_m*t)


def _d58cd29c07ed204bea32(V_Ed, V_pl_Rd):
    # EN 1993-1-1 6.2.8(3): Reduction factor for shear, ρ
    return numpy.select([numpy.less_equal(abs(V_Ed), (1/2)*V_pl_Rd),numpy.greater(V_pl_Rd, abs(V_Ed)),True], [0,(-1 + 2*abs(V_Ed)/V_pl_Rd)**2,0], default=numpy.nan)


def _d5fc9885df801ff972ed(E, I, L_cr):
    # EN 1993-1-1 6.3.1.2(1): Elastic critical force for flexural buckling
    return numpy.pi**2*E*I/L_cr**2


def _d72bab8662fac64cd090(F_y, b, t, C_v2):
    # AISC 360-22 Eq. G3-1: Nominal shear strength of a single-angle leg
    return 0.6*C_v2*F_y*b*t


def _d8d17ac992d61e68d61c(n_y, k_yy, M_y_Ed, chi_LT, M_y_Rk, k_yz, M_z_Ed, M_z_Rk, gamma_M1):
    # EN 1993-1-1 Eq. (6.61): Bending and axial compression, buckling about y-y
    return n_y + gamma_M1*k_yz*abs(M_z_Ed)/M_z_Rk + gamma_M1*k_yy*abs(M_y_Ed)/(M_y_Rk*chi_LT)


def _db064a284159df3d50f8(E, F_y):
    # AISC 360-22 Table B4.1b Case 15: Limit λp, web of a doubly symmetric I-shape, flexure
    return 3.76*numpy.sqrt(E/F_y)


def _dc5afa061c21b87c533b(h_tw):
    # AISC 360-22 Table B4.1b note [a]: Flange local buckling coefficient
    return functools.reduce(numpy.minimum, [0.76, functools.reduce(numpy.maximum, [0.35, 4/numpy.sqrt(h_tw)])])


def _dc696f9983c3fc880f29(eps):
    # EN 1993-1-1 Table 5.2 (sheet 1): Class 3 limit of an internal part in compression
    return 42*eps


def _deedddcb16058df1ab71(P_r, P_c, M_rx, M_cx, M_ry, M_cy):
    # AISC 360-22 Eq. H1-1a, H1-1b: Interaction of axial force and flexure
    return numpy.select([numpy.greater_equal(P_r/P_c, 0.2),True], [P_r/P_c + (8/9)*M_ry/M_cy + (8/9)*M_rx/M_cx,(1/2)*P_r/P_c + M_ry/M_cy + M_rx/M_cx], default=numpy.nan)


def _e1fc3dc267f4757b97dc(C_my, C_mLT, mu_y, r_y, C_yy, section_class):
    # EN 1993-1-1 Annex A, Table A.1: Interaction factor k_yy (Method 1)
    return numpy.select([numpy.less_equal(section_class, 2),True], [C_mLT*C_my*mu_y/(C_yy*(1 - r_y)),C_mLT*C_my*mu_y/(1 - r_y)], default=numpy.nan)


def _e2586545e62ce0c7f5b0(F_y, S):
    # AISC 360-22 Section F10.1: Yield moment about the axis of bending
    return F_y*S


def _e33f93f62e06bad49456(h_w, t_w, eta):
    # EN 1993-1-1 6.2.6(3)d: Shear area of a welded I-section, load parallel to the web
    return eta*h_w*t_w


def _e673c70fd97a3c8b8d3a(n_y, k_yy, M_y_Ed, chi_LT, M_y_Rk, gamma_M1):
    # EN 1993-1-1 Eq. (6.61): Bending about y-y and axial compression, buckling about y-y
    return n_y + gamma_M1*k_yy*abs(M_y_Ed)/(M_y_Rk*chi_LT)


def _e687105f48613fb1dcf1(N_Ed, N_pl_Rd):
    # EN 1993-1-1 6.2.9.1(5): Ratio of axial force to plastic resistance, n
    return abs(N_Ed)/N_pl_Rd


def _e81119fa9125bdc416f1(r):
    # EN 1993-1-1 Annex A, Table A.2: C_mi,0 for a central point load
    return 0.03*r + 1


def _e85f65b31e65d8a74047(E, F_y):
    # AISC 360-22 Table B4.1a Case 1: Limit λr, flange of a rolled I-shape, axial compression
    return 0.56*numpy.sqrt(E/F_y)


def _e92e10dae0ec7bcf9015(C_m, alpha, P_r, P_e1):
    # AISC 360-22 Eq. A-8-3: Multiplier for P-δ effects
    return numpy.select([numpy.greater_equal(P_r/P_e1, 0),numpy.less(alpha*abs(P_r), P_e1)], [1,functools.reduce(numpy.maximum, [1, C_m/(1 - alpha*abs(P_r)/P_e1)])], default=numpy.nan)


def _eacc2e6adfe622ff75c4(f_ra, F_ca, f_rbw, F_cbw, f_rbz, F_cbz):
    # AISC 360-22 Eq. H2-1: Interaction of stresses at a point
    return abs(f_rbz/F_cbz + f_rbw/F_cbw + f_ra/F_ca)


def _eb77fc16745bc940ff21(F_y, Z_y, S_y):
    # AISC 360-22 Eq. F6-1: Nominal flexural strength, yielding (minor axis)
    return functools.reduce(numpy.minimum, [F_y*Z_y, 1.6*F_y*S_y])


def _ef572fd1566076ebea8f(F_cr, A_g):
    # AISC 360-22 Eq. G5-1: Nominal shear strength of a round HSS
    return (1/2)*A_g*F_cr


def _ef6a6b665d0c53b41b48(b_f):
    # AISC 360-22 Section B4.1a: Flange half-width, b = bf/2 (rolled I-shape)
    return (1/2)*b_f


def _f17fc1f3de102ca772c0(b, h, t, R_m):
    # EN 10210-2:2006 and EN 10219-2:2006 Annex B (A_h): Area enclosed by the mid-line of the wall, rectangular hollow section
    return -R_m**2*(4 - numpy.pi) + (b - t)*(h - t)


def _f1d9b4d6c4bd5d11cf6a(M_p, F_y, S_y, lam, lam_pf, lam_rf, E):
    # AISC 360-22 Eq. F6-2, F6-3, F6-4: Nominal flexural strength, flange local buckling
    return numpy.select([numpy.less_equal(lam, lam_rf),True], [M_p - (lam - lam_pf)*(-0.7*F_y*S_y + M_p)/(-lam_pf + lam_rf),0.69*E*S_y/lam**2], default=numpy.nan)


def _f3111dfcf6a86f9afbc0(F_cr_a, F_cr_b, F_y):
    # AISC 360-22 Section H3.1(a): Critical stress of a round HSS in torsion
    return functools.reduce(numpy.minimum, [0.6*F_y, functools.reduce(numpy.maximum, [F_cr_a, F_cr_b])])


def _f35fef2057fcbcbefd78(L_cr, i, lambda_1):
    # EN 1993-1-1 Eq. (6.50): Non-dimensional slenderness
    return L_cr/(i*lambda_1)


def _f4f697ca1c4a14df697a(W_pl, W_el):
    # EN 1993-1-1 Annex A, Table A.1: Auxiliary term w = W_pl/W_el ≤ 1.5
    return functools.reduce(numpy.minimum, [1.5, W_pl/W_el])


def _f621d9b9d204fd5e70de(d, t_w):
    # AISC 360-22 Section G2.1: Web area, Aw = d·tw
    return d*t_w


def _f7e7ed600e478b2ac869(section_class):
    # EN 1993-1-1 6.2.9.1(6): Exponent α of the biaxial criterion, I-section
    return numpy.select([numpy.less_equal(section_class, 2),True], [2,1], default=numpy.nan)


def _f858ae49c52b6e519313(M_y):
    # AISC 360-22 Section F10.2(b)(2)(i): Yield moment for LTB, 0.80 of the geometric
    return 0.8*M_y


def _f9c22f94a7d18ff29662(I_t, t, tau_Rd):
    # EN 1993-1-1 6.2.7(1), (5), Eq. (6.23): Torsional resistance, open section
    return I_t*tau_Rd/t


def _fb0573ff322c9c6113c8(c_t, limit_1, limit_2, limit_3):
    # EN 1993-1-1 Table 5.2: Class of a part from its c/t ratio and the three limits
    return numpy.select([numpy.less_equal(c_t, limit_1),numpy.less_equal(c_t, limit_2),numpy.less_equal(c_t, limit_3),True], [1,2,3,4], default=numpy.nan)


def _fb39b8bb1c1a0ae7453f(C_mz, lambda_z, n_z, section_class):
    # EN 1993-1-1 Annex B, Table B.1: Interaction factor k_zz, I-section
    return numpy.select([numpy.less_equal(section_class, 2),True], [C_mz*functools.reduce(numpy.minimum, [1.4*n_z + 1, n_z*(2*lambda_z - 0.6) + 1]),C_mz*functools.reduce(numpy.minimum, [0.6*n_z + 1, 0.6*lambda_z*n_z + 1])], default=numpy.nan)


def _fc0b86f61b049afe7451(A, h_w, t_w):
    # EN 1993-1-1 6.2.6(3)e: Shear area of an I-section, load parallel to the flanges
    return A - h_w*t_w


def _fc88bd377ce3419b759b(E, b, t, C_b, L_b):
    # AISC 360-22 Eq. F10-5a: Elastic LTB moment, equal-leg angle, toe in compression
    return 0.58*C_b*E*b**4*t*(numpy.sqrt(0.88*L_b**2*t**2/b**4 + 1) - 1)/L_b**2


def _ffe97ef7f0d7bd6b5ecc(h_t, E, F_y):
    # AISC 360-22 Eq. H3-3, H3-4, H3-5: Critical stress of a rectangular HSS in torsion
    return numpy.select([numpy.less_equal(h_t, 2.45*numpy.sqrt(E/F_y)),numpy.less_equal(h_t, 3.07*numpy.sqrt(E/F_y)),True], [0.6*F_y,1.47*F_y*numpy.sqrt(E/F_y)/h_t,0.458*numpy.pi**2*E/h_t**2], default=numpy.nan)


FUNCTIONS = {
    "00c8dea2b6d2c695a39b": _00c8dea2b6d2c695a39b,
    "02edf9672d435a483665": _02edf9672d435a483665,
    "02f1d2811f39b7ec8635": _02f1d2811f39b7ec8635,
    "0429c11d2458d362675c": _0429c11d2458d362675c,
    "069e4d3cd77d05aed615": _069e4d3cd77d05aed615,
    "06a2360bfd1de0ee22b6": _06a2360bfd1de0ee22b6,
    "0839fff909ccaabe4193": _0839fff909ccaabe4193,
    "086ab2f9163d829e242f": _086ab2f9163d829e242f,
    "095dc1363414c6727ceb": _095dc1363414c6727ceb,
    "0d139d9445353a67bbb9": _0d139d9445353a67bbb9,
    "0d48632a2ae683840ed3": _0d48632a2ae683840ed3,
    "0ef822dbee9a4e6e5af3": _0ef822dbee9a4e6e5af3,
    "11c913d3ba6c08a6f16f": _11c913d3ba6c08a6f16f,
    "1226452d5ae3a903cf87": _1226452d5ae3a903cf87,
    "123963307ea8562b93d3": _123963307ea8562b93d3,
    "13aaf77b4ecc4782305d": _13aaf77b4ecc4782305d,
    "13ef280319349a572351": _13ef280319349a572351,
    "1439263560bd3f059103": _1439263560bd3f059103,
    "15f142db5f16997c16d9": _15f142db5f16997c16d9,
    "1681a6181b3cd6598ac1": _1681a6181b3cd6598ac1,
    "1d8bfc7916147fe794e4": _1d8bfc7916147fe794e4,
    "215e871c3b9f9a9561db": _215e871c3b9f9a9561db,
    "218fcbcaf3f8ead15ba8": _218fcbcaf3f8ead15ba8,
    "21f8d3b1de72b1f48061": _21f8d3b1de72b1f48061,
    "23b3e31a231be6b34c0c": _23b3e31a231be6b34c0c,
    "24f86a2a37775dd2b3ad": _24f86a2a37775dd2b3ad,
    "2591b6c97a2e54900118": _2591b6c97a2e54900118,
    "27522fc680246d1a9232": _27522fc680246d1a9232,
    "2910791acf975b049344": _2910791acf975b049344,
    "2b82d3179344a75017b7": _2b82d3179344a75017b7,
    "2b99b3f4bea66a8ae504": _2b99b3f4bea66a8ae504,
    "2cacbdee24ad514d39f1": _2cacbdee24ad514d39f1,
    "2d02a653481b5f241f7d": _2d02a653481b5f241f7d,
    "31cdcda6dcc19c4a3227": _31cdcda6dcc19c4a3227,
    "336f85ec8d5a1f26a81e": _336f85ec8d5a1f26a81e,
    "343b7ece5a462d0489a1": _343b7ece5a462d0489a1,
    "347d64da819a5807c838": _347d64da819a5807c838,
    "34a384cad20da7fa7fc6": _34a384cad20da7fa7fc6,
    "3531dc15afa1c3c380c1": _3531dc15afa1c3c380c1,
    "35be6253a3612eaaede0": _35be6253a3612eaaede0,
    "360a3ce6dc79299771c7": _360a3ce6dc79299771c7,
    "362d849919d4749b52ca": _362d849919d4749b52ca,
    "3a12862e9a711196a587": _3a12862e9a711196a587,
    "3a3fe7cc1dbd0f233257": _3a3fe7cc1dbd0f233257,
    "3dd3202a8c28b52cb272": _3dd3202a8c28b52cb272,
    "3e6240a336d5a5b6112e": _3e6240a336d5a5b6112e,
    "3fb4ae6c2547534b9412": _3fb4ae6c2547534b9412,
    "43e583211c0b74309c01": _43e583211c0b74309c01,
    "4406c4c7f0c37849579c": _4406c4c7f0c37849579c,
    "44437356c4f5d32105c7": _44437356c4f5d32105c7,
    "45a9555bfde48a4ebac2": _45a9555bfde48a4ebac2,
    "466e1ff29c4bad9f8e26": _466e1ff29c4bad9f8e26,
    "468d5b94783a5c147e02": _468d5b94783a5c147e02,
    "4784815596a3f7bac197": _4784815596a3f7bac197,
    "4889372fd95577256d94": _4889372fd95577256d94,
    "49f3f66d56fc53a12c4e": _49f3f66d56fc53a12c4e,
    "4b93d3f7880dc7f94e01": _4b93d3f7880dc7f94e01,
    "4d5e37c65134456daf08": _4d5e37c65134456daf08,
    "4e6d474011dcfd1f3428": _4e6d474011dcfd1f3428,
    "5132d068284fa6fc3913": _5132d068284fa6fc3913,
    "515b0aec15468072be21": _515b0aec15468072be21,
    "547046bc175cd02c08d0": _547046bc175cd02c08d0,
    "547eb829b8d846322511": _547eb829b8d846322511,
    "555999658d56a35ed6cb": _555999658d56a35ed6cb,
    "57bb8f8297635007d9b2": _57bb8f8297635007d9b2,
    "58f8cd2ce20ebb53188d": _58f8cd2ce20ebb53188d,
    "5dbf5128df6ef63fee29": _5dbf5128df6ef63fee29,
    "5e91245b7b98f766f926": _5e91245b7b98f766f926,
    "60076b235db70a7c438f": _60076b235db70a7c438f,
    "61033bf8d0814c6623c0": _61033bf8d0814c6623c0,
    "6179be05e9d32de4185a": _6179be05e9d32de4185a,
    "62b2c72e231a54c2cdd9": _62b2c72e231a54c2cdd9,
    "64df9f199da5f9f4d2bf": _64df9f199da5f9f4d2bf,
    "66bb4027d1e4439220ca": _66bb4027d1e4439220ca,
    "6916531ac6c696cb24a9": _6916531ac6c696cb24a9,
    "693b6aa468da87845f2e": _693b6aa468da87845f2e,
    "6944a5828cc6dd0cc29a": _6944a5828cc6dd0cc29a,
    "6aa5c1f5250fea7df1a9": _6aa5c1f5250fea7df1a9,
    "6af3b4022b88243288ee": _6af3b4022b88243288ee,
    "6b2ee64c2b878b38fb61": _6b2ee64c2b878b38fb61,
    "6b6def47ce058e80922e": _6b6def47ce058e80922e,
    "6ceeac84a61bf70ffb70": _6ceeac84a61bf70ffb70,
    "6f4216d75cf039ef8c09": _6f4216d75cf039ef8c09,
    "705d1c3ce35be1cfc4ca": _705d1c3ce35be1cfc4ca,
    "709b39a9e897d31a3654": _709b39a9e897d31a3654,
    "7444a196e0c28f2aab0e": _7444a196e0c28f2aab0e,
    "74ecd0f3e35b26b8f66a": _74ecd0f3e35b26b8f66a,
    "759f4c42562f49eb798d": _759f4c42562f49eb798d,
    "7673888dbae4f34b7089": _7673888dbae4f34b7089,
    "770850eca8da6495e97c": _770850eca8da6495e97c,
    "77f20c75cb8dd5a3f922": _77f20c75cb8dd5a3f922,
    "7b5a09dd4e484fe07baf": _7b5a09dd4e484fe07baf,
    "7b94e6b1d46ab495aec2": _7b94e6b1d46ab495aec2,
    "7beaf44b036bf7c0a6b6": _7beaf44b036bf7c0a6b6,
    "7f0ad753675816955567": _7f0ad753675816955567,
    "83735bc998e3f9032378": _83735bc998e3f9032378,
    "8941ba3018d7c4da8efa": _8941ba3018d7c4da8efa,
    "8cb77420f6b79da407bf": _8cb77420f6b79da407bf,
    "8cc19139d286c3e0d3c2": _8cc19139d286c3e0d3c2,
    "8e668b6cdfc43e3298c0": _8e668b6cdfc43e3298c0,
    "8ff5794b5c1fb26fd139": _8ff5794b5c1fb26fd139,
    "906cc9b7326bd407e2a2": _906cc9b7326bd407e2a2,
    "92199254275541027b3b": _92199254275541027b3b,
    "987ae3cf58517372f266": _987ae3cf58517372f266,
    "997ab3fe735748908034": _997ab3fe735748908034,
    "9b9bd93673a09d933586": _9b9bd93673a09d933586,
    "9e2817142db9818ebb5d": _9e2817142db9818ebb5d,
    "a0259eb1464452636c95": _a0259eb1464452636c95,
    "a1d811c244c23a656593": _a1d811c244c23a656593,
    "a23b40a872992b706624": _a23b40a872992b706624,
    "a46a8809267c7f4b3a3b": _a46a8809267c7f4b3a3b,
    "a4dd29e038d0bb5848b9": _a4dd29e038d0bb5848b9,
    "a52c8a43208c508b2c9d": _a52c8a43208c508b2c9d,
    "a661bc4a59d8174df986": _a661bc4a59d8174df986,
    "a6fd63aa0f785d4a2fe7": _a6fd63aa0f785d4a2fe7,
    "a7577ca2a7988b0f4528": _a7577ca2a7988b0f4528,
    "a8860c685b53af0d20b1": _a8860c685b53af0d20b1,
    "a8daed80b44009104e72": _a8daed80b44009104e72,
    "aa29a9e86ac8598d7feb": _aa29a9e86ac8598d7feb,
    "ac61001bff5ddfb4353c": _ac61001bff5ddfb4353c,
    "acb9fcfde25855bca109": _acb9fcfde25855bca109,
    "acd522560216e9a8e5a2": _acd522560216e9a8e5a2,
    "ad1124a63ccf9db69b73": _ad1124a63ccf9db69b73,
    "ada8a6e7d995f3b785a2": _ada8a6e7d995f3b785a2,
    "adeba23d3423b09471da": _adeba23d3423b09471da,
    "ae71aaa64bbb7c595492": _ae71aaa64bbb7c595492,
    "aed897c6603e1a9b5064": _aed897c6603e1a9b5064,
    "af8934e238e12ca5aace": _af8934e238e12ca5aace,
    "af9849b67255cd834e28": _af9849b67255cd834e28,
    "b18a461b65e9665f3856": _b18a461b65e9665f3856,
    "b1dde4caf1a28f0f0d9e": _b1dde4caf1a28f0f0d9e,
    "b26d990aa331a1150fd8": _b26d990aa331a1150fd8,
    "b3c7f45661e0b04d42c4": _b3c7f45661e0b04d42c4,
    "b461767123fab5da53ca": _b461767123fab5da53ca,
    "b4b3cb4f99d908167488": _b4b3cb4f99d908167488,
    "b74aa1bdb1a71561356b": _b74aa1bdb1a71561356b,
    "b800764b2b4f7e736507": _b800764b2b4f7e736507,
    "b83ebeb6559328560261": _b83ebeb6559328560261,
    "b86f3872000aaaeb7ff8": _b86f3872000aaaeb7ff8,
    "b941de2eb4708831fe61": _b941de2eb4708831fe61,
    "ba4c1eb426b844a00c0f": _ba4c1eb426b844a00c0f,
    "ba60d3ef0bfee0b95f40": _ba60d3ef0bfee0b95f40,
    "bc0c5d3b767b25173efd": _bc0c5d3b767b25173efd,
    "bc9b2e2c73729b9b06e8": _bc9b2e2c73729b9b06e8,
    "bcf1509c586b11be2a3f": _bcf1509c586b11be2a3f,
    "c0b245bec74298f53be9": _c0b245bec74298f53be9,
    "c0d46e2aec8bb27ba4f4": _c0d46e2aec8bb27ba4f4,
    "c380faef19ad693e0db2": _c380faef19ad693e0db2,
    "c383e27d633b8a2fd2e1": _c383e27d633b8a2fd2e1,
    "c4686c0f0c10319639ef": _c4686c0f0c10319639ef,
    "c5ec42bcf88fd4a4c228": _c5ec42bcf88fd4a4c228,
    "c65d60e151d3b34f26c1": _c65d60e151d3b34f26c1,
    "c6b9a3c1bc233218634d": _c6b9a3c1bc233218634d,
    "c7ec74e5824e3c89db9b": _c7ec74e5824e3c89db9b,
    "c9321b59dafead64b748": _c9321b59dafead64b748,
    "cafc46190d87a4080415": _cafc46190d87a4080415,
    "ccbce2fc341bab48375d": _ccbce2fc341bab48375d,
    "ccc0b0e200afd0c59bce": _ccc0b0e200afd0c59bce,
    "ccc1468ea91a9d7409b9": _ccc1468ea91a9d7409b9,
    "ce2c5756bd228041db56": _ce2c5756bd228041db56,
    "cf31d720b242fe13da62": _cf31d720b242fe13da62,
    "d0583cdfdac436eea4ce": _d0583cdfdac436eea4ce,
    "d06027cd009b3c69ea06": _d06027cd009b3c69ea06,
    "d063fe98f6a4773bcaea": _d063fe98f6a4773bcaea,
    "d0f17538c605a55fa899": _d0f17538c605a55fa899,
    "d22d3001e283e3415b81": _d22d3001e283e3415b81,
    "d2e7c4af2b915f33f31c": _d2e7c4af2b915f33f31c,
    "d58cd29c07ed204bea32": _d58cd29c07ed204bea32,
    "d5fc9885df801ff972ed": _d5fc9885df801ff972ed,
    "d72bab8662fac64cd090": _d72bab8662fac64cd090,
    "d8d17ac992d61e68d61c": _d8d17ac992d61e68d61c,
    "db064a284159df3d50f8": _db064a284159df3d50f8,
    "dc5afa061c21b87c533b": _dc5afa061c21b87c533b,
    "dc696f9983c3fc880f29": _dc696f9983c3fc880f29,
    "deedddcb16058df1ab71": _deedddcb16058df1ab71,
    "e1fc3dc267f4757b97dc": _e1fc3dc267f4757b97dc,
    "e2586545e62ce0c7f5b0": _e2586545e62ce0c7f5b0,
    "e33f93f62e06bad49456": _e33f93f62e06bad49456,
    "e673c70fd97a3c8b8d3a": _e673c70fd97a3c8b8d3a,
    "e687105f48613fb1dcf1": _e687105f48613fb1dcf1,
    "e81119fa9125bdc416f1": _e81119fa9125bdc416f1,
    "e85f65b31e65d8a74047": _e85f65b31e65d8a74047,
    "e92e10dae0ec7bcf9015": _e92e10dae0ec7bcf9015,
    "eacc2e6adfe622ff75c4": _eacc2e6adfe622ff75c4,
    "eb77fc16745bc940ff21": _eb77fc16745bc940ff21,
    "ef572fd1566076ebea8f": _ef572fd1566076ebea8f,
    "ef6a6b665d0c53b41b48": _ef6a6b665d0c53b41b48,
    "f17fc1f3de102ca772c0": _f17fc1f3de102ca772c0,
    "f1d9b4d6c4bd5d11cf6a": _f1d9b4d6c4bd5d11cf6a,
    "f3111dfcf6a86f9afbc0": _f3111dfcf6a86f9afbc0,
    "f35fef2057fcbcbefd78": _f35fef2057fcbcbefd78,
    "f4f697ca1c4a14df697a": _f4f697ca1c4a14df697a,
    "f621d9b9d204fd5e70de": _f621d9b9d204fd5e70de,
    "f7e7ed600e478b2ac869": _f7e7ed600e478b2ac869,
    "f858ae49c52b6e519313": _f858ae49c52b6e519313,
    "f9c22f94a7d18ff29662": _f9c22f94a7d18ff29662,
    "fb0573ff322c9c6113c8": _fb0573ff322c9c6113c8,
    "fb39b8bb1c1a0ae7453f": _fb39b8bb1c1a0ae7453f,
    "fc0b86f61b049afe7451": _fc0b86f61b049afe7451,
    "fc88bd377ce3419b759b": _fc88bd377ce3419b759b,
    "ffe97ef7f0d7bd6b5ecc": _ffe97ef7f0d7bd6b5ecc,
}
