"""Numeric functions of the clauses, written by calcsheet.standards.write_clause_code.

Do not edit: run ``python -m calcsheet.standards.write_clause_code`` after changing a
clause (a test says when). Each function is sympy's NumPy printing of the clause's
expression; the key is :attr:`calcsheet.standards.clause.Clause.written_key`.
"""

# ruff: noqa

import functools

import numpy

# The printer writes Abs as a bare abs(), which lambdify's NumPy namespace makes numpy's.
abs = numpy.absolute

def _00a0df0414000edad7d0(F_cr, A_g):
    # AISC 360-22 Eq. G5-1: Nominal shear strength of a round HSS
    # expression ef572fd1566076ebea8f
    return (1/2)*A_g*F_cr


def _014350b74fb2e48aa90f(N_c, A, M, W_el, h, c):
    # EN 1993-1-1 Table 5.2 (sheet 1): End stress ratio ψ of an internal part
    # expression 0429c11d2458d362675c
    return numpy.select([numpy.greater(N_c/A, -c*abs(M)/(W_el*h)),True], [(-c*abs(M)/(W_el*h) + N_c/A)/(c*abs(M)/(W_el*h) + N_c/A),-1], default=numpy.nan)


def _027b898f729662e1ec84(E, F_y):
    # AISC 360-22 Table B4.1b Case 20: Limit λp, round HSS, flexure
    # expression 6b6def47ce058e80922e
    return 0.07*E/F_y


def _02d03cf6ab306ddea859(C_my, a_LT, lambda_0, lambda_0_lim, r_z, r_T):
    # EN 1993-1-1 Annex A, Table A.2: Equivalent uniform moment factor {C_mLT}
    # expression 6944a5828cc6dd0cc29a
    return numpy.select([numpy.less_equal(lambda_0, lambda_0_lim),numpy.greater((1 - r_T)*(1 - r_z), 0),True], [1,functools.reduce(numpy.maximum, [1, C_my**2*a_LT/numpy.sqrt((1 - r_T)*(1 - r_z))]),1], default=numpy.nan)


def _035c0d914bb25ec7f5ce(E, F_y, L_v, D, D_t):
    # AISC 360-22 Eq. G5-2a, G5-2b: Shear critical stress of a round HSS
    # expression 35be6253a3612eaaede0
    return functools.reduce(numpy.minimum, [0.6*F_y, functools.reduce(numpy.maximum, [0.78*E/D_t**(3/2), 1.6*E/(D_t**(5/4)*numpy.sqrt(L_v/D))])])


def _051314e3339b1ec40ef1(eps):
    # EN 1993-1-1 Table 5.2 (sheet 3): Class 1 limit of a tube, d/t ≤ 50ε²
    # expression 336f85ec8d5a1f26a81e
    return 50*eps**2


def _064757b2a5030b696d34(b, lam, lam_r, F_y, F_cr, F_el):
    # AISC 360-22 Eq. E7-2, E7-3, Table E7.1 case (b): Effective width, walls of square and rectangular HSS (c1 = 0.2)
    # expression 218fcbcaf3f8ead15ba8
    return numpy.select([numpy.less_equal(lam, lam_r*numpy.sqrt(F_y/F_cr)),True], [b,b*numpy.sqrt(F_el/F_cr)*(1 - 0.2*numpy.sqrt(F_el/F_cr))], default=numpy.nan)


def _06cfbc34383808f9918d(L_cr, i, lambda_1):
    # EN 1993-1-1 Eq. (6.50): Non-dimensional slenderness
    # expression f35fef2057fcbcbefd78
    return L_cr/(i*lambda_1)


def _089986e6cbb4712a4c06(lam_r, lam, F_y):
    # AISC 360-22 Eq. E7-5, Table E7.1 case (c): Elastic local buckling stress, all other elements (c2 = 1.49)
    # expression 45a9555bfde48a4ebac2
    return 2.2201*F_y*lam_r**2/lam**2


def _08d7dc40d9f8eccf5cb2(w_z, C_mz, lambda_max, n_pl, e_LT, W_el_z, W_pl_z):
    # EN 1993-1-1 Annex A, Table A.1: Auxiliary term {C_zz}
    # expression ccc0b0e200afd0c59bce
    return functools.reduce(numpy.maximum, [W_el_z/W_pl_z, (-e_LT + n_pl*(-1.6*C_mz**2*lambda_max**2/w_z - 1.6*C_mz**2*lambda_max/w_z + 2))*(w_z - 1) + 1])


def _099f5a92aad7b72b802a(E, nu):
    # EN 1993-1-1 3.2.6(1): Shear modulus
    # expression 0d48632a2ae683840ed3
    return E/(2*nu + 2)


def _0abcf4569f948ff63b67(C_my, C_mLT, mu_y, r_y, C_yy, section_class):
    # EN 1993-1-1 Annex A, Table A.1: Interaction factor {k_yy} (Method 1)
    # expression e1fc3dc267f4757b97dc
    return numpy.select([numpy.less_equal(section_class, 2),True], [C_mLT*C_my*mu_y/(C_yy*(1 - r_y)),C_mLT*C_my*mu_y/(1 - r_y)], default=numpy.nan)


def _0adf476e694febdd65ef(psi, r):
    # EN 1993-1-1 Annex A, Table A.2: {C_mi_0} for end moments (ψ) or a uniform moment (ψ = 1)
    # expression 3a12862e9a711196a587
    return 0.21*psi + r*(0.36*psi - 0.1188) + 0.79


def _1065ebafe9d0406926f1(M_p, F_y, S, lam, lam_rf, E, S_e):
    # AISC 360-22 Eq. F7-2, F7-3: Nominal flexural strength, flange local buckling
    # expression a1d811c244c23a656593
    return numpy.select([numpy.less_equal(lam, lam_rf),True], [functools.reduce(numpy.minimum, [M_p, M_p - (-F_y*S + M_p)*(3.57*lam*numpy.sqrt(F_y/E) - 4.0)]),F_y*S_e], default=numpy.nan)


def _10dd47ff3bf0334c5f98(outside, t):
    # AISC 360-22 Section B4.1b: Flat width of an HSS wall, outside dimension less 3t
    # expression 74ecd0f3e35b26b8f66a
    return outside - 3*t


def _12de56c4824687d6344b(M_y_Ed, M_N_y_Rd, M_z_Ed, M_N_z_Rd, alpha, beta):
    # EN 1993-1-1 Eq. (6.41): Bi-axial bending with axial force
    # expression a8860c685b53af0d20b1
    return (abs(M_y_Ed)/M_N_y_Rd)**alpha + (abs(M_z_Ed)/M_N_z_Rd)**beta


def _14e8f8d45ab0ec3f8110(M_p, F_y, S_y, lam, lam_pf, lam_rf, E):
    # AISC 360-22 Eq. F6-2, F6-3, F6-4: Nominal flexural strength, flange local buckling
    # expression f1d9b4d6c4bd5d11cf6a
    return numpy.select([numpy.less_equal(lam, lam_rf),True], [M_p - (lam - lam_pf)*(-0.7*F_y*S_y + M_p)/(-lam_pf + lam_rf),0.69*E*S_y/lam**2], default=numpy.nan)


def _162bff335d15c64dd5ec(E, D_t):
    # AISC 360-22 Eq. H3-2b: Torsional buckling stress of a round HSS
    # expression a0259eb1464452636c95
    return 0.6*E/D_t**(3/2)


def _16d2e3a76315b11b035a(E_I, K, L):
    # AISC 360-22 Eq. A-8-5: Elastic critical buckling strength in the plane of bending
    # expression 77f20c75cb8dd5a3f922
    return numpy.pi**2*E_I/(K**2*L**2)


def _18093701ba6af73f1e51(M_pl_y_Rd, n, a):
    # EN 1993-1-1 Eq. (6.36): Reduced major-axis plastic moment of an I-section
    # expression 347d64da819a5807c838
    return functools.reduce(numpy.minimum, [M_pl_y_Rd, M_pl_y_Rd*(1 - n)/(1 - 1/2*a)])


def _1bac423d00a775e682c5(f_235, f_y):
    # EN 1993-1-1 Table 5.2: ε = √(235/{f_y})
    # expression 515b0aec15468072be21
    return numpy.sqrt(f_235/f_y)


def _1c2783bbded1c5ead865(F_y, S):
    # AISC 360-22 Section F10.1: Yield moment about the axis of bending
    # expression e2586545e62ce0c7f5b0
    return F_y*S


def _1c9f1650b76e484a0dca(n_y, k_yy, M_y_Ed, chi_LT, M_y_Rk, gamma_M1):
    # EN 1993-1-1 Eq. (6.61): Bending about y-y and axial compression, buckling about y-y
    # expression e673c70fd97a3c8b8d3a
    return n_y + gamma_M1*k_yy*abs(M_y_Ed)/(M_y_Rk*chi_LT)


def _1decd329c05d71bf5d0d(F_cr_a, F_cr_b, F_y):
    # AISC 360-22 Section H3.1(a): Critical stress of a round HSS in torsion
    # expression f3111dfcf6a86f9afbc0
    return functools.reduce(numpy.minimum, [0.6*F_y, functools.reduce(numpy.maximum, [F_cr_a, F_cr_b])])


def _1e0cdf3fb7a8cc8840ff(A_m, t, tau_Rd):
    # EN 1993-1-1 6.2.7(1), (5), Eq. (6.23): Torsional resistance, closed section
    # expression 06a2360bfd1de0ee22b6
    return 2*A_m*t*tau_Rd


def _1e5fb128d2ac1a5557aa(I, A, H, t, b, b_e):
    # AISC 360-22 Section F7.2(c): Effective section modulus: elastic, without b − be of the compression flange
    # expression 60076b235db70a7c438f
    return (-A*t*((1/2)*H - 1/2*t)**2*(b - b_e)/(A - t*(b - b_e)) + I)/((1/2)*H + t*((1/2)*H - 1/2*t)*(b - b_e)/(A - t*(b - b_e)))


def _20976ff9092632ebd881(E, F_y):
    # AISC 360-22 Table B4.1a Case 5: Limit λr, web of a doubly symmetric I-shape, axial compression
    # expression d0f17538c605a55fa899
    return 1.49*numpy.sqrt(E/F_y)


def _214ef4b3ac9b1afa4a01(A_g, h, h_e, t_w, b, b_e, t_f):
    # AISC 360-22 Section E7.1: Effective area: Ag less the ineffective widths
    # expression 468d5b94783a5c147e02
    return A_g - t_f*(4*b - 4*b_e) - t_w*(h - h_e)


def _22e53b0c6d167e7635c4(G, I_t, E, I_w, L_T, i_y, i_z):
    # EN 1993-1-1 Annex A, Table A.1: Elastic torsional buckling force
    # expression c383e27d633b8a2fd2e1
    return (numpy.pi**2*E*I_w/L_T**2 + G*I_t)/(i_y**2 + i_z**2)


def _22f0a22a1d412da352e1(I_t, t, tau_Rd):
    # EN 1993-1-1 6.2.7(1), (5), Eq. (6.23): Torsional resistance, open section
    # expression f9c22f94a7d18ff29662
    return I_t*tau_Rd/t


def _23171e67a033b3a49780(A, b, t_f, t_w, r, h_w, eta):
    # EN 1993-1-1 6.2.6(3)a: Shear area of a rolled I-section, load parallel to the web
    # expression 2d02a653481b5f241f7d
    return functools.reduce(numpy.maximum, [eta*h_w*t_w, A - 2*b*t_f + t_f*(2*r + t_w)])


def _258848dbdc25a51bdbfe(k_zz, section_class):
    # EN 1993-1-1 Annex B, Table B.1: Interaction factor {k_yz}
    # expression 0d139d9445353a67bbb9
    return numpy.select([numpy.less_equal(section_class, 2),True], [0.6*k_zz,k_zz], default=numpy.nan)


def _271cee536b13a0021df0(A_v, f_y, gamma_M0):
    # EN 1993-1-1 Eq. (6.18): Plastic shear resistance
    # expression c9321b59dafead64b748
    return (1/3)*numpy.sqrt(3)*A_v*f_y/gamma_M0


def _27dc689f173292b711f5(E, F_y):
    # AISC 360-22 Table B4.1b Case 12: Limit λr, leg of a single angle, flexure
    # expression b4b3cb4f99d908167488
    return 0.91*numpy.sqrt(E/F_y)


def _2849cee110596e703bb8(A, f_y, N_cr):
    # EN 1993-1-1 Eq. (6.50): Non-dimensional slenderness
    # expression 6179be05e9d32de4185a
    return numpy.sqrt(A*f_y/N_cr)


def _2a3a4952d025e541bc8c(C_mz, mu_z, r_z, C_zz, section_class):
    # EN 1993-1-1 Annex A, Table A.1: Interaction factor {k_zz} (Method 1)
    # expression 4889372fd95577256d94
    return numpy.select([numpy.less_equal(section_class, 2),True], [C_mz*mu_z/(C_zz*(1 - r_z)),C_mz*mu_z/(1 - r_z)], default=numpy.nan)


def _2b12a2220bce94c6e2e6(E, F_y, D_t, A_g):
    # AISC 360-22 Eq. E7-6: Effective area of a round HSS
    # expression acb9fcfde25855bca109
    return numpy.select([numpy.less_equal(D_t, 0.11*E/F_y),True], [A_g,A_g*(2/3 + 0.038*E/(D_t*F_y))], default=numpy.nan)


def _2b716ad4aa8ffaa35003(Phi_LT, lambda_LT, beta):
    # EN 1993-1-1 Eq. (6.57): Reduction factor for lateral-torsional buckling, rolled
    # expression 2b99b3f4bea66a8ae504
    return functools.reduce(numpy.minimum, [1, lambda_LT**(-2.0), (Phi_LT + numpy.sqrt(Phi_LT**2 - beta*lambda_LT**2))**(-1.0)])


def _2bb71fcd792abc81cc33(C_mz, lambda_z, n_z, section_class):
    # EN 1993-1-1 Annex B, Table B.1: Interaction factor {k_zz}, hollow section
    # expression b18a461b65e9665f3856
    return numpy.select([numpy.less_equal(section_class, 2),True], [C_mz*functools.reduce(numpy.minimum, [0.8*n_z + 1, n_z*(lambda_z - 0.2) + 1]),C_mz*functools.reduce(numpy.minimum, [0.6*n_z + 1, 0.6*lambda_z*n_z + 1])], default=numpy.nan)


def _2bde56bed6e23b72e999(F_cr, A_e):
    # AISC 360-22 Eq. E7-1: Nominal compressive strength, slender elements
    # expression a4dd29e038d0bb5848b9
    return A_e*F_cr


def _2c7e1059e879939c46c6(chi_LT, W_y, f_y, gamma_M1):
    # EN 1993-1-1 Eq. (6.55): Design buckling resistance moment
    # expression ce2c5756bd228041db56
    return W_y*chi_LT*f_y/gamma_M1


def _2e20ca5d1ad280b112be(Phi_LT, lambda_LT):
    # EN 1993-1-1 Eq. (6.56): Reduction factor for lateral-torsional buckling, general
    # expression 123963307ea8562b93d3
    return functools.reduce(numpy.minimum, [1, (Phi_LT + numpy.sqrt(Phi_LT**2 - lambda_LT**2))**(-1.0)])


def _2f017dc2a0409eaf832f(n_y, k_yy, M_y_Ed, chi_LT, M_y_Rk, k_yz, M_z_Ed, M_z_Rk, gamma_M1):
    # EN 1993-1-1 Eq. (6.61): Bending and axial compression, buckling about y-y
    # expression d8d17ac992d61e68d61c
    return n_y + gamma_M1*k_yz*abs(M_z_Ed)/M_z_Rk + gamma_M1*k_yy*abs(M_y_Ed)/(M_y_Rk*chi_LT)


def _2fca0588d8c734e7a6ad(W_pl_y, W_el_y, section_class):
    # EN 1993-1-1 6.3.2.2(1): Section modulus for lateral-torsional buckling
    # expression cafc46190d87a4080415
    return numpy.select([numpy.less_equal(section_class, 2),numpy.less_equal(section_class, 3)], [W_pl_y,W_el_y], default=numpy.nan)


def _3078f856876962e622f0(C_my, lambda_y, n_y, section_class):
    # EN 1993-1-1 Annex B, Table B.1: Interaction factor {k_yy}
    # expression 8e668b6cdfc43e3298c0
    return numpy.select([numpy.less_equal(section_class, 2),True], [C_my*functools.reduce(numpy.minimum, [0.8*n_y + 1, n_y*(lambda_y - 0.2) + 1]),C_my*functools.reduce(numpy.minimum, [0.6*n_y + 1, 0.6*lambda_y*n_y + 1])], default=numpy.nan)


def _30e18a8c76376011cf84(F_u, A_e):
    # AISC 360-22 Eq. D2-2: Nominal tensile strength, rupture in the net section
    # expression 1681a6181b3cd6598ac1
    return A_e*F_u


def _31083cd2ee307a6fc2f0(F_y, Z):
    # AISC 360-22 Eq. F2-1: Plastic moment
    # expression af8934e238e12ca5aace
    return F_y*Z


def _31e534460627237d0901(n_y, k_yz, M_z_Ed, M_z_Rk, gamma_M1):
    # EN 1993-1-1 Eq. (6.61): Bending about z-z and axial compression, buckling about y-y
    # expression 069e4d3cd77d05aed615
    return n_y + gamma_M1*k_yz*abs(M_z_Ed)/M_z_Rk


def _3291f1c639f3b2629103(sigma_x, tau, f_y, gamma_M0):
    # EN 1993-1-1 Eq. (6.1): Yield criterion at a point of a member (σz = 0)
    # expression 34a384cad20da7fa7fc6
    return gamma_M0**2*sigma_x**2/f_y**2 + 3*gamma_M0**2*tau**2/f_y**2


def _34505fae50ead40a6ebb(A):
    # EN 1993-1-1 6.2.6(3)g: Shear area of a CHS of uniform thickness
    # expression 66bb4027d1e4439220ca
    return 2*A/numpy.pi


def _34d36e5b7ebacfd877bc(eps):
    # EN 1993-1-1 Table 5.2 (sheet 1): Class 3 limit of an internal part in compression
    # expression dc696f9983c3fc880f29
    return 42*eps


def _3652991feed9a791d723(E, F_y):
    # AISC 360-22 Table B4.1a Case 6: Limit λr, wall of a rectangular HSS, axial compression
    # expression 8ff5794b5c1fb26fd139
    return 1.4*numpy.sqrt(E/F_y)


def _384f6e71f7f7fe21646e(chi, A, f_y, gamma_M1):
    # EN 1993-1-1 Eq. (6.47): Buckling resistance of a compression member
    # expression b3c7f45661e0b04d42c4
    return A*chi*f_y/gamma_M1


def _39a0063a170918b115d2(N_c, f_y, c, t_total):
    # EN 1993-1-1 Table 5.2 (sheet 1): Compressed fraction α of an internal part at full plasticity
    # expression b83ebeb6559328560261
    return functools.reduce(numpy.minimum, [1, functools.reduce(numpy.maximum, [0.05, (1/2)*N_c/(c*f_y*t_total) + 1/2])])


def _3a79fb2edff5bd0b68de(h_tw, k_v, E, F_y):
    # AISC 360-22 Eq. G2-9, G2-10, G2-11: Web shear buckling coefficient
    # expression 31cdcda6dcc19c4a3227
    return numpy.select([numpy.less_equal(h_tw, 1.1*numpy.sqrt(E*k_v/F_y)),numpy.less_equal(h_tw, 1.37*numpy.sqrt(E*k_v/F_y)),True], [1,1.1*numpy.sqrt(E*k_v/F_y)/h_tw,1.51*E*k_v/(F_y*h_tw**2)], default=numpy.nan)


def _3ac74121876738f136bf(C_my, C_mLT, mu_z, r_y, C_zy, w_y, w_z, section_class):
    # EN 1993-1-1 Annex A, Table A.1: Interaction factor {k_zy} (Method 1)
    # expression ac61001bff5ddfb4353c
    return numpy.select([numpy.less_equal(section_class, 2),True], [0.6*C_mLT*C_my*mu_z*numpy.sqrt(w_y/w_z)/(C_zy*(1 - r_y)),C_mLT*C_my*mu_z/(1 - r_y)], default=numpy.nan)


def _3c09c6f13ec3b00d1c77(a_LT, lambda_0, lambda_z, M_y_Ed, C_my, chi_LT, M_pl_y_Rd, M_z_Ed, C_mz, M_pl_z_Rd):
    # EN 1993-1-1 Annex A, Table A.1: Auxiliary term {d_LT}
    # expression 4406c4c7f0c37849579c
    return 2*a_LT*lambda_0*abs(M_y_Ed)*abs(M_z_Ed)/(C_my*C_mz*M_pl_y_Rd*M_pl_z_Rd*chi_LT*(lambda_z**4 + 0.1))


def _3c7ebd3189d3c028c5f5(eps):
    # EN 1993-1-1 Table 5.2 (sheet 1): Class 2 limit of an internal part in compression
    # expression 21f8d3b1de72b1f48061
    return 38*eps


def _3cd33a9bd738ee808e76(C_1, C_2, z_g, E, I_z, I_w, G, I_t, L_LT):
    # NCCI SN003a-EN-EU (Access Steel), Elastic critical moment for lateral torsional buckling: three-factor formula, {k} = {k_w}: Elastic critical moment for lateral-torsional buckling
    # expression a52c8a43208c508b2c9d
    return numpy.pi**2*C_1*E*I_z*(-C_2*z_g + numpy.sqrt(C_2**2*z_g**2 + I_w/I_z + G*I_t*L_LT**2/(numpy.pi**2*E*I_z)))/L_LT**2


def _3ed5b3bc7cf73a850e6e(d, t_f):
    # AISC 360-22 Section F2.2: Distance between flange centroids, ho = d − tf
    # expression 0839fff909ccaabe4193
    return d - t_f


def _408dd13706027d1a8a74(eps):
    # EN 1993-1-1 Table 5.2 (sheet 3): Class 3 limit of a tube, d/t ≤ 90ε²
    # expression 8cc19139d286c3e0d3c2
    return 90*eps**2


def _43b926b1519038a96584(E, F_y):
    # AISC 360-22 Table B4.1b Case 10: Limit λr, flange of a rolled I-shape, flexure
    # expression 02edf9672d435a483665
    return 1.0*numpy.sqrt(E/F_y)


def _44665f0069b4b12e97fe(F_y, A_w, C_v1):
    # AISC 360-22 Eq. G2-1: Nominal shear strength
    # expression acd522560216e9a8e5a2
    return 0.6*A_w*C_v1*F_y


def _44856750aab618fce045(N_Ed, N_Rd, M_y_Ed, M_y_Rd, M_z_Ed, M_z_Rd):
    # EN 1993-1-1 Eq. (6.2): Linear interaction of axial force and bending
    # expression 6aa5c1f5250fea7df1a9
    return abs(N_Ed)/N_Rd + abs(M_z_Ed)/M_z_Rd + abs(M_y_Ed)/M_y_Rd


def _45f91c8b2282b65bb33a(k_c):
    # EN 1993-1-1 Annex A, Table A.2: Factor C1 = {k_c}⁻²
    # expression 24f86a2a37775dd2b3ad
    return k_c**(-2.0)


def _46da740437d2a0e6081c(M_pl_Rd, n, a):
    # EN 1993-1-1 Eq. (6.39), (6.40): Reduced plastic moment of an RHS
    # expression ada8a6e7d995f3b785a2
    return functools.reduce(numpy.minimum, [M_pl_Rd, M_pl_Rd*(1 - n)/(1 - 1/2*a)])


def _48cf1504573184e3e7c3(L_c, r):
    # AISC 360-22 Section E2: Slenderness ratio
    # expression c5ec42bcf88fd4a4c228
    return L_c/r


def _4c04d8ff8d3aeb264672(I_t, I_y):
    # EN 1993-1-1 Annex A, Table A.1: Auxiliary term {a_LT}
    # expression b941de2eb4708831fe61
    return functools.reduce(numpy.maximum, [0, -I_t/I_y + 1])


def _4c572a4a891be19ac5bf(b_f):
    # AISC 360-22 Section B4.1a: Flange half-width, b = bf/2 (rolled I-shape)
    # expression ef6a6b665d0c53b41b48
    return (1/2)*b_f


def _4d310390b2d67881c8e4(M_y):
    # AISC 360-22 Section F10.2(b)(2)(i): Yield moment for LTB, 0.80 of the geometric
    # expression f858ae49c52b6e519313
    return 0.8*M_y


def _4d33f7a11b29c455b519(n_z, k_zy, M_y_Ed, chi_LT, M_y_Rk, k_zz, M_z_Ed, M_z_Rk, gamma_M1):
    # EN 1993-1-1 Eq. (6.62): Bending and axial compression, buckling about z-z
    # expression d06027cd009b3c69ea06
    return n_z + gamma_M1*k_zz*abs(M_z_Ed)/M_z_Rk + gamma_M1*k_zy*abs(M_y_Ed)/(M_y_Rk*chi_LT)


def _50e61967187a168d41ce(r_y, E, F_y):
    # AISC 360-22 Eq. F2-5: Limiting laterally unbraced length for yielding
    # expression 709b39a9e897d31a3654
    return 1.76*r_y*numpy.sqrt(E/F_y)


def _514514abf910387e709d(E, F_y):
    # AISC 360-22 Table B4.1b Case 10: Limit λp, flange of a rolled I-shape, flexure
    # expression 43e583211c0b74309c01
    return 0.38*numpy.sqrt(E/F_y)


def _519cd80a4246de1e3c56(W_pl, W_el, f_y, section_class):
    # EN 1993-1-1 Table 6.7: Characteristic moment resistance
    # expression 362d849919d4749b52ca
    return numpy.select([numpy.less_equal(section_class, 2),numpy.less_equal(section_class, 3)], [W_pl*f_y,W_el*f_y], default=numpy.nan)


def _51eb14d82e6b56ad9974(D, t):
    # AISC 360-22 Section H3.1, User Note: Torsional constant of a round HSS
    # expression 2cacbdee24ad514d39f1
    return (1/2)*numpy.pi*t*(D - t)**2


def _5259b436203124c10c93(f_a, F_ca, f_b, F_cb):
    # AISC 360-22 Section H3.3(c), Eq. H3-9: Buckling under the compressive normal stress
    # expression 3e6240a336d5a5b6112e
    return f_b/F_cb + f_a/F_ca


def _533bc9d5fdbcd0e261e8(n_z, k_zz, M_z_Ed, M_z_Rk, gamma_M1):
    # EN 1993-1-1 Eq. (6.62): Bending about z-z and axial compression, buckling about z-z
    # expression 6ceeac84a61bf70ffb70
    return n_z + gamma_M1*k_zz*abs(M_z_Ed)/M_z_Rk


def _55203b5f614e26ba2a23(n, section_class):
    # EN 1993-1-1 6.2.9.1(6): Exponent β of the biaxial criterion, I-section
    # expression 6af3b4022b88243288ee
    return numpy.select([numpy.less_equal(section_class, 2),True], [functools.reduce(numpy.maximum, [1, 5*n]),1], default=numpy.nan)


def _589d0ad57d94b60f4c8c(A, b, t):
    # EN 1993-1-1 6.2.9.1(5): Web area ratio {a_w} of an RHS
    # expression aa29a9e86ac8598d7feb
    return functools.reduce(numpy.minimum, [0.5, (A - 2*b*t)/A])


def _5a523d462bc085a715c9(a_LT, lambda_0, lambda_z, M_y_Ed, C_my, chi_LT, M_pl_y_Rd):
    # EN 1993-1-1 Annex A, Table A.1: Auxiliary term {e_LT}
    # expression adeba23d3423b09471da
    return 1.7*a_LT*lambda_0*abs(M_y_Ed)/(C_my*M_pl_y_Rd*chi_LT*(lambda_z**4 + 0.1))


def _5bc1ed79f22254e3c72a(E, I_z, I_w, G, I_t, L_LT):
    # EN 1993-1-1 Annex A, Table A.2: Elastic critical moment under uniform moment (for {lambda_0})
    # expression ad1124a63ccf9db69b73
    return numpy.pi**2*E*I_z*numpy.sqrt(I_w/I_z + G*I_t*L_LT**2/(numpy.pi**2*E*I_z))/L_LT**2


def _601dfd4344d06680c615(M_y, M_cr):
    # AISC 360-22 Eq. F10-2, F10-3: Nominal flexural strength, lateral-torsional buckling
    # expression 6f4216d75cf039ef8c09
    return numpy.select([numpy.less_equal(M_y/M_cr, 1),True], [functools.reduce(numpy.minimum, [1.5*M_y, M_y*(1.92 - 1.17*numpy.sqrt(M_y/M_cr))]),M_cr*(-0.17*M_cr/M_y + 0.92)], default=numpy.nan)


def _618cfafff2ca199e5f53(E, F_y):
    # AISC 360-22 Table B4.1b Case 15: Limit λp, web of a doubly symmetric I-shape, flexure
    # expression db064a284159df3d50f8
    return 3.76*numpy.sqrt(E/F_y)


def _624f39d77712b8a7a38f(eps, eta):
    # EN 1993-1-1 6.2.6(6): Web slenderness limit without shear buckling check
    # expression 6916531ac6c696cb24a9
    return 72*eps/eta


def _627bb76523d2d07c3e1f(M_p, C_b, F_y, S_x, L_b, L_p, L_r, E, J, A_g, r_y):
    # AISC 360-22 Eq. F7-10, F7-11: Nominal flexural strength, lateral-torsional buckling
    # expression a6fd63aa0f785d4a2fe7
    return numpy.select([numpy.less_equal(L_b, L_p),numpy.less_equal(L_b, L_r),True], [M_p,functools.reduce(numpy.minimum, [M_p, C_b*(M_p - (L_b - L_p)*(-0.7*F_y*S_x + M_p)/(-L_p + L_r))]),functools.reduce(numpy.minimum, [M_p, 2*C_b*E*r_y*numpy.sqrt(A_g*J)/L_b])], default=numpy.nan)


def _639c5e4d319ab4fb24e2(n_z, k_zy, M_y_Ed, chi_LT, M_y_Rk, gamma_M1):
    # EN 1993-1-1 Eq. (6.62): Bending about y-y and axial compression, buckling about z-z
    # expression 83735bc998e3f9032378
    return n_z + gamma_M1*k_zy*abs(M_y_Ed)/(M_y_Rk*chi_LT)


def _6498b7fab63f89a9851e(F_y, b, t, C_v2):
    # AISC 360-22 Eq. G3-1: Nominal shear strength of a single-angle leg
    # expression d72bab8662fac64cd090
    return 0.6*C_v2*F_y*b*t


def _66a39b40f967fff16a4f(E, F_y):
    # AISC 360-22 Table B4.1b Case 12: Limit λp, leg of a single angle, flexure
    # expression 44437356c4f5d32105c7
    return 0.54*numpy.sqrt(E/F_y)


def _6717a9cc3d66fbede095(w_y, w_z, C_my, lambda_max, n_pl, d_LT, W_el_y, W_pl_y):
    # EN 1993-1-1 Annex A, Table A.1: Auxiliary term {C_zy}
    # expression b74aa1bdb1a71561356b
    return functools.reduce(numpy.maximum, [0.6*W_el_y*numpy.sqrt(w_y/w_z)/W_pl_y, (-d_LT + n_pl*(-14*C_my**2*lambda_max**2/w_y**5 + 2))*(w_y - 1) + 1])


def _69e42f02943e8bb4e4ba(sigma_x, sigma_z, tau, f_y, gamma_M0):
    # EN 1993-1-1 Eq. (6.1): Yield criterion at a critical point
    # expression a46a8809267c7f4b3a3b
    return gamma_M0**2*sigma_x**2/f_y**2 - gamma_M0**2*sigma_x*sigma_z/f_y**2 + gamma_M0**2*sigma_z**2/f_y**2 + 3*gamma_M0**2*tau**2/f_y**2


def _6b59ee406761b4ca5566(E, F_y):
    # AISC 360-22 Table B4.1b Case 20: Limit λr, round HSS, flexure
    # expression ba60d3ef0bfee0b95f40
    return 0.31*E/F_y


def _6c14c7afc0b04bc53981(W_pl, W_el):
    # EN 1993-1-1 Annex A, Table A.1: Auxiliary term w = {W_pl}/{W_el} ≤ 1.5
    # expression f4f697ca1c4a14df697a
    return functools.reduce(numpy.minimum, [1.5, W_pl/W_el])


def _6f1b5550e44f0984e61d(w_y, C_my, lambda_max, n_pl, b_LT, W_el_y, W_pl_y):
    # EN 1993-1-1 Annex A, Table A.1: Auxiliary term {C_yy}
    # expression 759f4c42562f49eb798d
    return functools.reduce(numpy.maximum, [W_el_y/W_pl_y, (-b_LT + n_pl*(-1.6*C_my**2*lambda_max**2/w_y - 1.6*C_my**2*lambda_max/w_y + 2))*(w_y - 1) + 1])


def _72354d9a1abc03a1830f(lam_r, lam, F_y):
    # AISC 360-22 Eq. E7-5, Table E7.1 case (b): Elastic local buckling stress, walls of square and rectangular HSS (c2 = 1.38)
    # expression 1439263560bd3f059103
    return 1.9044*F_y*lam_r**2/lam**2


def _727e3cad30667bd7502f(b, lam, lam_r, F_y, F_cr, F_el):
    # AISC 360-22 Eq. E7-2, E7-3, Table E7.1 case (a): Effective width, stiffened elements except walls of square and rectangular HSS (c1 = 0.18)
    # expression 7f0ad753675816955567
    return numpy.select([numpy.less_equal(lam, lam_r*numpy.sqrt(F_y/F_cr)),True], [b,b*numpy.sqrt(F_el/F_cr)*(1 - 0.18*numpy.sqrt(F_el/F_cr))], default=numpy.nan)


def _75c4563aad20d6a60e7e(C_b, E, L_b, r_ts, J, c, S_x, h_o):
    # AISC 360-22 Eq. F2-4: Critical stress for lateral-torsional buckling
    # expression 11c913d3ba6c08a6f16f
    return numpy.pi**2*C_b*E*r_ts**2*numpy.sqrt(0.078*J*L_b**2*c/(S_x*h_o*r_ts**2) + 1)/L_b**2


def _7706b88a8c1199acc1fb(N_Ed, N_pl_Rd):
    # EN 1993-1-1 6.2.9.1(5): Ratio of axial force to plastic resistance, n
    # expression e687105f48613fb1dcf1
    return abs(N_Ed)/N_pl_Rd


def _787f9f09962f2d316ef5(d, t):
    # EN 1993-1-1 6.2.7(4): Area enclosed by the mid-line of the wall, circular section
    # expression c0b245bec74298f53be9
    return (1/4)*numpy.pi*(d - t)**2


def _7891655c24b497d7b0b5(E, r_y, J, A_g, F_y, S_x):
    # AISC 360-22 Eq. F7-13: Limiting laterally unbraced length for inelastic LTB
    # expression a8daed80b44009104e72
    return 2.85714285714286*E*r_y*numpy.sqrt(A_g*J)/(F_y*S_x)


def _7b4656f4ad858bdda0b9(F_y):
    # AISC 360-22 Eq. H3-7: Nominal stress, yielding under normal stress
    # expression 02f1d2811f39b7ec8635
    return F_y


def _815c301704bf0d8e1cd5(E, F_y):
    # AISC 360-22 Table B4.1b Case 19: Limit λp, web of a rectangular HSS, flexure
    # expression 3a3fe7cc1dbd0f233257
    return 2.42*numpy.sqrt(E/F_y)


def _81e10ae4b43b376ab6b4(F_y, b_f, t_f, C_v2):
    # AISC 360-22 Eq. G6-1: Nominal weak-axis shear strength, both flanges
    # expression 4e6d474011dcfd1f3428
    return 1.2*C_v2*F_y*b_f*t_f


def _835c5007267a8446fffb(F_y, Z_y, S_y):
    # AISC 360-22 Eq. F6-1: Nominal flexural strength, yielding (minor axis)
    # expression eb77fc16745bc940ff21
    return functools.reduce(numpy.minimum, [F_y*Z_y, 1.6*F_y*S_y])


def _83ef9733f5073f1f1857(E, F_y):
    # AISC 360-22 Table B4.1b Case 15: Limit λr, web of a doubly symmetric I-shape, flexure
    # expression 086ab2f9163d829e242f
    return 5.7*numpy.sqrt(E/F_y)


def _8579c9d60769d3a8d29c(N_Ed, N_cr):
    # EN 1993-1-1 Annex A, Table A.1: Critical force ratio r = {N_Ed}/{N_cr}
    # expression 7b5a09dd4e484fe07baf
    return N_Ed/N_cr


def _87335147d7601893e884(h_tw):
    # AISC 360-22 Table B4.1b note [a]: Flange local buckling coefficient
    # expression dc5afa061c21b87c533b
    return functools.reduce(numpy.minimum, [0.76, functools.reduce(numpy.maximum, [0.35, 4/numpy.sqrt(h_tw)])])


def _879c54f807c51e5b74f0(N_Ed, A, M_Ed, W_el):
    # EN 1993-1-1 6.2.9.2(1), Eq. (6.42): Largest longitudinal stress, elastic
    # expression 987ae3cf58517372f266
    return abs(M_Ed)/W_el + abs(N_Ed)/A


def _87b62a9aad812fcaffa0(P_r, P_c, M_rx, M_cx, M_ry, M_cy):
    # AISC 360-22 Eq. H1-1a, H1-1b: Interaction of axial force and flexure
    # expression deedddcb16058df1ab71
    return numpy.select([numpy.greater_equal(P_r/P_c, 0.2),True], [P_r/P_c + (8/9)*M_ry/M_cy + (8/9)*M_rx/M_cx,(1/2)*P_r/P_c + M_ry/M_cy + M_rx/M_cx], default=numpy.nan)


def _8ac035390de41c3926bb(M_p, F_y, S, lam_w, E):
    # AISC 360-22 Eq. F7-6: Nominal flexural strength, web local buckling
    # expression 555999658d56a35ed6cb
    return functools.reduce(numpy.minimum, [M_p, M_p - (-F_y*S + M_p)*(0.305*lam_w*numpy.sqrt(F_y/E) - 0.738)])


def _8afc53eed18ffccc9c02(f_ra, F_ca, f_rbw, F_cbw, f_rbz, F_cbz):
    # AISC 360-22 Eq. H2-1: Interaction of stresses at a point
    # expression eacc2e6adfe622ff75c4
    return abs(f_rbz/F_cbz + f_rbw/F_cbw + f_ra/F_ca)


def _8b0a3edbcdf2b3e765fd(A, h_load, h_other):
    # EN 1993-1-1 6.2.6(3)f: Shear area of an RHS of uniform thickness
    # expression 6b2ee64c2b878b38fb61
    return A*h_load/(h_load + h_other)


def _8d744ebacd65536bc32c(d, k_des):
    # AISC 360-22 Section B4.1b: Web height, {h} = {d} − 2·{k_des} (rolled shape, fillets excluded)
    # expression 547046bc175cd02c08d0
    return d - 2*k_des


def _8faef24ad81d91963278(E, b, t, C_b, L_b):
    # AISC 360-22 Eq. F10-5a: Elastic LTB moment, equal-leg angle, toe in compression
    # expression fc88bd377ce3419b759b
    return 0.58*C_b*E*b**4*t*(numpy.sqrt(0.88*L_b**2*t**2/b**4 + 1) - 1)/L_b**2


def _92567c67f1ace904d72b(eps, alpha):
    # EN 1993-1-1 Table 5.2 (sheet 1): Class 1 limit of an internal part
    # expression 9b9bd93673a09d933586
    return numpy.select([numpy.greater(alpha, 0.5),True], [396*eps/(13*alpha - 1),36*eps/alpha], default=numpy.nan)


def _92f6cca6f37c3f85a98d(F_y):
    # AISC 360-22 Eq. H3-8: Nominal stress, shear yielding
    # expression 3531dc15afa1c3c380c1
    return 0.6*F_y


def _95241162cab57d594696(alpha_LT, lambda_LT):
    # EN 1993-1-1 6.3.2.2(1): Value to determine {chi_LT}, general case
    # expression 49f3f66d56fc53a12c4e
    return (1/2)*alpha_LT*(lambda_LT - 0.2) + (1/2)*lambda_LT**2 + 1/2


def _95f71cf0b5c5f5fc55d1(b, t):
    # AISC 360-22 Section B4.1: Width-to-thickness ratio
    # expression 27522fc680246d1a9232
    return b/t


def _96a0e1910a0ca2e6b47c(V_Ed, V_pl_Rd):
    # EN 1993-1-1 6.2.8(3): Reduction factor for shear, ρ
    # expression d58cd29c07ed204bea32
    return numpy.select([numpy.less_equal(abs(V_Ed), (1/2)*V_pl_Rd),numpy.greater(V_pl_Rd, abs(V_Ed)),True], [0,(-1 + 2*abs(V_Ed)/V_pl_Rd)**2,0], default=numpy.nan)


def _97ae6723f6e395407bd4(b, lam, lam_r, F_y, F_cr, F_el):
    # AISC 360-22 Eq. E7-2, E7-3, Table E7.1 case (c): Effective width, all other elements (c1 = 0.22)
    # expression 61033bf8d0814c6623c0
    return numpy.select([numpy.less_equal(lam, lam_r*numpy.sqrt(F_y/F_cr)),True], [b,b*numpy.sqrt(F_el/F_cr)*(1 - 0.22*numpy.sqrt(F_el/F_cr))], default=numpy.nan)


def _97c77636158bd94555f5(E, F_y):
    # AISC 360-22 Table B4.1a Case 9: Limit λr, round HSS, axial compression
    # expression a23b40a872992b706624
    return 0.11*E/F_y


def _97f5c5ec9cbed96c94cc(I_y, C_w, S_x):
    # AISC 360-22 Eq. F2-7: Effective radius of gyration
    # expression 215e871c3b9f9a9561db
    return numpy.sqrt(numpy.sqrt(C_w*I_y)/S_x)


def _98bda609bd77f4f3ad7d(h, t):
    # AISC 360-22 Section G4: Shear area of a rectangular HSS, Aw = 2·h·t
    # expression 997ab3fe735748908034
    return 2*h*t


def _99609295bc094468c016(A, h_w, t_w):
    # EN 1993-1-1 6.2.6(3)e: Shear area of an I-section, load parallel to the flanges
    # expression fc0b86f61b049afe7451
    return A - h_w*t_w


def _9a57fb3ce9b2d0889950(N_Ed, A, M_y_Ed, W_el_y, M_z_Ed, W_el_z):
    # EN 1993-1-1 6.2.9.2(1), Eq. (6.42): Largest longitudinal stress, elastic
    # expression 7444a196e0c28f2aab0e
    return abs(M_z_Ed)/W_el_z + abs(M_y_Ed)/W_el_y + abs(N_Ed)/A


def _9ce49b98ae83701bade0(E, F_y):
    # AISC 360-22 Table B4.1a Case 3: Limit λr, leg of a single angle, axial compression
    # expression 58f8cd2ce20ebb53188d
    return 0.45*numpy.sqrt(E/F_y)


def _9e4af35594526d778540(h_tw, k_v, E, F_y):
    # AISC 360-22 Eq. G2-2, G2-3, G2-4: Web shear strength coefficient
    # expression ccbce2fc341bab48375d
    return numpy.select([numpy.less_equal(h_tw, 1.1*numpy.sqrt(E*k_v/F_y)),True], [1,1.1*numpy.sqrt(E*k_v/F_y)/h_tw], default=numpy.nan)


def _9f08219dfc3a878011a8(E, L_c, r):
    # AISC 360-22 Eq. E3-4: Elastic buckling stress
    # expression 360a3ce6dc79299771c7
    return numpy.pi**2*E*r**2/L_c**2


def _9f29896432f672ab8b4b(d, t_w):
    # AISC 360-22 Section G2.1: Web area, Aw = d·tw
    # expression f621d9b9d204fd5e70de
    return d*t_w


def _a01ca54322030a0235f1(T_t, A_m, t):
    # EN 1993-1-1 6.2.7(4), (7): St Venant shear stress, closed thin-walled section
    # expression d2e7c4af2b915f33f31c
    return (1/2)*T_t/(A_m*t)


def _a4981c67240bce03cc81(tau_t, tau_Rd, V_pl_Rd):
    # EN 1993-1-1 6.2.7(9), Eq. (6.26): Plastic shear resistance with torsion, I or H
    # expression 64df9f199da5f9f4d2bf
    return V_pl_Rd*numpy.sqrt(functools.reduce(numpy.maximum, [0, 1 - 0.8*tau_t/tau_Rd]))


def _a53ff0c576f5e3706dc2(A_g, b_1, b_e1, b_2, b_e2, t):
    # AISC 360-22 Section E7.1: Effective area: Ag less the ineffective widths
    # expression b1dde4caf1a28f0f0d9e
    return A_g - t*(b_1 - b_e1) - t*(b_2 - b_e2)


def _abcd62f588d858168019(r):
    # EN 1993-1-1 Annex A, Table A.2: {C_mi_0} for a uniform load
    # expression d22d3001e283e3415b81
    return 1 - 0.18*r


def _ac130d50381924e62236(K, L):
    # AISC 360-22 Section E2: Effective length, Lc = K·L
    # expression 92199254275541027b3b
    return K*L


def _ac2cce500bb9f9473b01(r, chi):
    # EN 1993-1-1 Annex A, Table A.1: Auxiliary term μ
    # expression ba4c1eb426b844a00c0f
    return (1 - r)/(-chi*r + 1)


def _ad53b22d8e0b08f7ff1a(w_z, w_y, C_mz, lambda_max, n_pl, c_LT, W_el_z, W_pl_z):
    # EN 1993-1-1 Annex A, Table A.1: Auxiliary term {C_yz}
    # expression 7b94e6b1d46ab495aec2
    return functools.reduce(numpy.maximum, [0.6*W_el_z*numpy.sqrt(w_z/w_y)/W_pl_z, (-c_LT + n_pl*(-14*C_mz**2*lambda_max**2/w_z**5 + 2))*(w_z - 1) + 1])


def _adf237c4ca007462e211(h_w, t_w, eta):
    # EN 1993-1-1 6.2.6(3)d: Shear area of a welded I-section, load parallel to the web
    # expression e33f93f62e06bad49456
    return eta*h_w*t_w


def _ae9ef52d2817878b2e18(a_LT, lambda_0, M_y_Ed, chi_LT, M_pl_y_Rd, M_z_Ed, M_pl_z_Rd):
    # EN 1993-1-1 Annex A, Table A.1: Auxiliary term {b_LT}
    # expression 9e2817142db9818ebb5d
    return (1/2)*a_LT*lambda_0**2*abs(M_y_Ed)*abs(M_z_Ed)/(M_pl_y_Rd*M_pl_z_Rd*chi_LT)


def _af7659c74651c5b9bd4c(section_class):
    # EN 1993-1-1 6.2.9.1(6): Exponent α of the biaxial criterion, I-section
    # expression f7e7ed600e478b2ac869
    return numpy.select([numpy.less_equal(section_class, 2),True], [2,1], default=numpy.nan)


def _af961b31dcfe5cdaec58(N_Ed, chi, A, f_y, gamma_M1):
    # EN 1993-1-1 Eq. (6.61), (6.62): Axial force ratio for buckling, n = {N_Ed}/{N_b_Rd}
    # expression ccc1468ea91a9d7409b9
    return N_Ed*gamma_M1/(A*chi*f_y)


def _b1f4e73d2c6f47dfbf0a(F_y, S_c, lam, lam_r, E):
    # AISC 360-22 Eq. F10-6, F10-7, F10-8: Nominal flexural strength, leg local buckling
    # expression b26d990aa331a1150fd8
    return numpy.select([numpy.less_equal(lam, lam_r),True], [F_y*S_c*(-1.72*lam*numpy.sqrt(F_y/E) + 2.43),0.71*E*S_c/lam**2], default=numpy.nan)


def _b4363fd7287a59f6797d(P_r, P_c, M_rx, M_cx, M_ry, M_cy, v_ratio, T_r, T_c, eta_H1):
    # AISC 360-22 Eq. H3-6: Interaction of torsion, shear, flexure and axial force
    # expression b461767123fab5da53ca
    return numpy.select([numpy.greater(T_r, 0.2*T_c),True], [(v_ratio + T_r/T_c)**2 + P_r/P_c + M_ry/M_cy + M_rx/M_cx,eta_H1], default=numpy.nan)


def _b60f3b3772f0c207f24e(lam_r, lam, F_y):
    # AISC 360-22 Eq. E7-5, Table E7.1 case (a): Elastic local buckling stress, stiffened elements except walls of square and rectangular HSS (c2 = 1.31)
    # expression 095dc1363414c6727ceb
    return 1.7161*F_y*lam_r**2/lam**2


def _b6b2229bc2f2f642d8ca(M_y):
    # AISC 360-22 Eq. F10-1: Nominal flexural strength, yielding
    # expression 1226452d5ae3a903cf87
    return 1.5*M_y


def _b84177f2dc6d2a3733ae(A, b, t_f):
    # EN 1993-1-1 6.2.9.1(5): Web area ratio a of an I-section
    # expression 62b2c72e231a54c2cdd9
    return functools.reduce(numpy.minimum, [0.5, (A - 2*b*t_f)/A])


def _ba1433fc51b94a3f5966(A, f_y, gamma_M0):
    # EN 1993-1-1 Eq. (6.6), (6.10): Plastic resistance of the gross section
    # expression d0583cdfdac436eea4ce
    return A*f_y/gamma_M0


def _ba4ca434718b6d9e923b(eps, psi):
    # EN 1993-1-1 Table 5.2 (sheet 1): Class 3 limit of an internal part
    # expression 4784815596a3f7bac197
    return numpy.select([numpy.greater(psi, -1),True], [42*eps/(0.33*psi + 0.67),62*eps*numpy.sqrt(-psi)*(1 - psi)], default=numpy.nan)


def _bc452a7cd30d6d519593(N_Ed, A, f_y, gamma_M1):
    # EN 1993-1-1 Annex A, Table A.1: Auxiliary term {n_pl}
    # expression 8cb77420f6b79da407bf
    return N_Ed*gamma_M1/(A*f_y)


def _bd93fd2bc7eff38e5fe7(alpha, lambda_rel):
    # EN 1993-1-1 6.3.1.2(1): Value to determine the reduction factor χ
    # expression 7beaf44b036bf7c0a6b6
    return (1/2)*alpha*(lambda_rel - 0.2) + (1/2)*lambda_rel**2 + 1/2


def _c032b3011077b89fa653(M_pl_z_Rd, n, a):
    # EN 1993-1-1 Eq. (6.37), (6.38): Reduced minor-axis plastic moment of an I-section
    # expression a7577ca2a7988b0f4528
    return numpy.select([numpy.greater_equal(a, n),True], [M_pl_z_Rd,M_pl_z_Rd*(1 - (-a + n)**2/(1 - a)**2)], default=numpy.nan)


def _c0f6e5e77cdcb251f7cd(E, F_y):
    # AISC 360-22 Table B4.1a Case 1: Limit λr, flange of a rolled I-shape, axial compression
    # expression e85f65b31e65d8a74047
    return 0.56*numpy.sqrt(E/F_y)


def _c10d63b98496badca91a(E, C_w, L_cz, G, J, I_x, I_y):
    # AISC 360-22 Eq. E4-2: Elastic torsional buckling stress, doubly symmetric member
    # expression a661bc4a59d8174df986
    return (numpy.pi**2*C_w*E/L_cz**2 + G*J)/(I_x + I_y)


def _c183c7febd0abbaa2526(eps, alpha):
    # EN 1993-1-1 Table 5.2 (sheet 1): Class 2 limit of an internal part
    # expression 1d8bfc7916147fe794e4
    return numpy.select([numpy.greater(alpha, 0.5),True], [456*eps/(13*alpha - 1),41.5*eps/alpha], default=numpy.nan)


def _c2351e51a2ebaf10ca12(r_ts, E, F_y, J, c, S_x, h_o):
    # AISC 360-22 Eq. F2-6: Limiting unbraced length for inelastic LTB
    # expression d063fe98f6a4773bcaea
    return 2.78571428571429*E*r_ts*numpy.sqrt(J*c/(S_x*h_o) + numpy.sqrt(J**2*c**2/(S_x**2*h_o**2) + 3.3124*F_y**2/E**2))/F_y


def _c4e29e702f9204e918de(eps):
    # EN 1993-1-1 Table 5.2 (sheet 2): Class 3 limit of an outstand in compression
    # expression 466e1ff29c4bad9f8e26
    return 14*eps


def _c660ff90829afe01e978(F_cr, C):
    # AISC 360-22 Eq. H3-1: Nominal torsional strength of an HSS
    # expression 2910791acf975b049344
    return C*F_cr


def _c6e176136677cf461d73(C_m, alpha, P_r, P_e1):
    # AISC 360-22 Eq. A-8-3: Multiplier for P-δ effects
    # expression e92e10dae0ec7bcf9015
    return numpy.select([numpy.greater_equal(P_r/P_e1, 0),numpy.less(alpha*abs(P_r), P_e1)], [1,functools.reduce(numpy.maximum, [1, C_m/(1 - alpha*abs(P_r)/P_e1)])], default=numpy.nan)


def _c79722bdf79a3591bc10(W_pl, W_el, f_y, gamma_M0, section_class):
    # EN 1993-1-1 Eq. (6.13), (6.14): Bending resistance for the section class
    # expression 0ef822dbee9a4e6e5af3
    return numpy.select([numpy.less_equal(section_class, 2),numpy.less_equal(section_class, 3)], [W_pl*f_y/gamma_M0,W_el*f_y/gamma_M0], default=numpy.nan)


def _cac2c12a2910e5a71328(E, F_y):
    # AISC 360-22 Section G2.1(a): Web slenderness limit for φv = 1.00 (rolled I-shapes)
    # expression 3fb4ae6c2547534b9412
    return 2.24*numpy.sqrt(E/F_y)


def _cc63d99051ca0078d356(eps):
    # EN 1993-1-1 Table 5.2 (sheet 1): Class 1 limit of an internal part in compression
    # expression 8941ba3018d7c4da8efa
    return 33*eps


def _cdd01aabd4c18f908303(F_y, Z):
    # AISC 360-22 Eq. F7-1: Plastic moment
    # expression af8934e238e12ca5aace
    return F_y*Z


def _ced9f646bfb9306d6188(C_mz, mu_y, r_z, C_yz, w_z, w_y, section_class):
    # EN 1993-1-1 Annex A, Table A.1: Interaction factor {k_yz} (Method 1)
    # expression 705d1c3ce35be1cfc4ca
    return numpy.select([numpy.less_equal(section_class, 2),True], [0.6*C_mz*mu_y*numpy.sqrt(w_z/w_y)/(C_yz*(1 - r_z)),C_mz*mu_y/(1 - r_z)], default=numpy.nan)


def _d13bbe9b922aeab20ddc(F_y, A_w, C_v2):
    # AISC 360-22 Eq. G4-1: Nominal shear strength of a rectangular HSS
    # expression 5e91245b7b98f766f926
    return 0.6*A_w*C_v2*F_y


def _d45bbac482182b0ed550(k_yy, section_class):
    # EN 1993-1-1 Annex B, Table B.1: Interaction factor {k_zy}, no torsional deformation
    # expression bc0c5d3b767b25173efd
    return numpy.select([numpy.less_equal(section_class, 2),True], [0.6*k_yy,0.8*k_yy], default=numpy.nan)


def _d489e538056e9cf36996(eps):
    # EN 1993-1-1 Table 5.2 (sheet 2): Class 1 limit of an outstand in compression
    # expression 2591b6c97a2e54900118
    return 9*eps


def _d616960ce50a32281973(A_g, h, h_e, b, b_e, t):
    # AISC 360-22 Section E7.1: Effective area: Ag less the ineffective widths
    # expression 2b82d3179344a75017b7
    return A_g - t*(2*b - 2*b_e) - t*(2*h - 2*h_e)


def _d6c1b26e7d309b505739(t, E, F_y, lam, b):
    # AISC 360-22 Eq. F7-4: Effective width of the compression flange
    # expression c6b9a3c1bc233218634d
    return functools.reduce(numpy.minimum, [b, 1.92*t*numpy.sqrt(E/F_y)*(1 - 0.38*numpy.sqrt(E/F_y)/lam)])


def _d87bc1d24097dd330d52(h_t, E, F_y):
    # AISC 360-22 Eq. H3-3, H3-4, H3-5: Critical stress of a rectangular HSS in torsion
    # expression ffe97ef7f0d7bd6b5ecc
    return numpy.select([numpy.less_equal(h_t, 2.45*numpy.sqrt(E/F_y)),numpy.less_equal(h_t, 3.07*numpy.sqrt(E/F_y)),True], [0.6*F_y,1.47*F_y*numpy.sqrt(E/F_y)/h_t,0.458*numpy.pi**2*E/h_t**2], default=numpy.nan)


def _d96b46343ca79e1ef153(T_t, t, I_t):
    # EN 1993-1-1 6.2.7(4): St Venant shear stress, open section
    # expression b86f3872000aaaeb7ff8
    return T_t*t/I_t


def _db4c3cbc3242f2d66706(F_y, A_g):
    # AISC 360-22 Eq. D2-1: Nominal tensile strength, yielding in the gross section
    # expression bc9b2e2c73729b9b06e8
    return A_g*F_y


def _db61c54a10a0b86b8021(chi_LT, f, lambda_LT):
    # EN 1993-1-1 Eq. (6.58): Modified reduction factor for lateral-torsional buckling
    # expression bcf1509c586b11be2a3f
    return functools.reduce(numpy.minimum, [1, lambda_LT**(-2.0), chi_LT/f])


def _db95a24dcf7cb0f4f617(E, F_y, D_t, Z, S):
    # AISC 360-22 Eq. F8-1, F8-2, F8-3, F8-4: Nominal flexural strength, round HSS
    # expression 4b93d3f7880dc7f94e01
    return numpy.select([numpy.less_equal(D_t, 0.07*E/F_y),numpy.less_equal(D_t, 0.31*E/F_y),True], [F_y*Z,S*(F_y + 0.021*E/D_t),0.33*E*S/D_t], default=numpy.nan)


def _dc49fe9512f63d09a07c(C_my_0, lambda_0, lambda_0_lim, M_y_Ed, N_Ed, A, W_el_y, a_LT, r_y):
    # EN 1993-1-1 Annex A, Table A.2: Equivalent uniform moment factor {C_my}
    # expression c65d60e151d3b34f26c1
    return numpy.select([numpy.less_equal(lambda_0, lambda_0_lim),numpy.less_equal(r_y, 0),True], [C_my_0,1,C_my_0 + a_LT*numpy.sqrt(A/(N_Ed*W_el_y))*(1 - C_my_0)*numpy.sqrt(abs(M_y_Ed))/(a_LT*numpy.sqrt(A/(N_Ed*W_el_y))*numpy.sqrt(abs(M_y_Ed)) + 1)], default=numpy.nan)


def _dd7cbefdb56bddcc1a12(M_p, C_b, F_y, S_x, L_b, L_p, L_r, F_cr):
    # AISC 360-22 Eq. F2-1, F2-2, F2-3: Nominal flexural strength, yielding and LTB
    # expression 5132d068284fa6fc3913
    return numpy.select([numpy.less_equal(L_b, L_p),numpy.less_equal(L_b, L_r),True], [M_p,functools.reduce(numpy.minimum, [M_p, C_b*(M_p - (L_b - L_p)*(-0.7*F_y*S_x + M_p)/(-L_p + L_r))]),functools.reduce(numpy.minimum, [M_p, F_cr*S_x])], default=numpy.nan)


def _ddae9f88d66fb4c939c7(tau_t, tau_Rd, V_pl_Rd):
    # EN 1993-1-1 6.2.7(9), Eq. (6.28): Plastic shear resistance with torsion, hollow
    # expression c7ec74e5824e3c89db9b
    return V_pl_Rd*functools.reduce(numpy.maximum, [0, 1 - tau_t/tau_Rd])


def _de654250a912c31dbf0f(f_y, gamma_M0):
    # EN 1993-1-1 6.2.7(5), 6.2.1(5) Eq. (6.1): Design shear strength, yield criterion
    # expression c4686c0f0c10319639ef
    return (1/3)*numpy.sqrt(3)*f_y/gamma_M0


def _df95e87b0b0e11d6d85f(C_1, r_z, r_T):
    # EN 1993-1-1 Annex A, Table A.2: Slenderness limit of {lambda_0} below which torsion is not considered
    # expression af9849b67255cd834e28
    return 0.2*numpy.sqrt(C_1)*functools.reduce(numpy.maximum, [0, (1 - r_T)*(1 - r_z)])**0.25


def _e09cce2008cc484b0d6a(C_mz, lambda_z, n_z, section_class):
    # EN 1993-1-1 Annex B, Table B.1: Interaction factor {k_zz}, I-section
    # expression fb39b8bb1c1a0ae7453f
    return numpy.select([numpy.less_equal(section_class, 2),True], [C_mz*functools.reduce(numpy.minimum, [1.4*n_z + 1, n_z*(2*lambda_z - 0.6) + 1]),C_mz*functools.reduce(numpy.minimum, [0.6*n_z + 1, 0.6*lambda_z*n_z + 1])], default=numpy.nan)


def _e0aa9fd8c02541de0735(E, f_y):
    # EN 1993-1-1 6.3.1.3(1): Slenderness at which the Euler stress equals {f_y}
    # expression 00c8dea2b6d2c695a39b
    return numpy.pi*numpy.sqrt(E/f_y)


def _e0d84e9e2ffca6d42559(alpha_LT, lambda_LT, lambda_LT_0, beta):
    # EN 1993-1-1 6.3.2.3(1): Value to determine {chi_LT}, rolled or equivalent welded
    # expression c0d46e2aec8bb27ba4f4
    return (1/2)*alpha_LT*(lambda_LT - lambda_LT_0) + (1/2)*beta*lambda_LT**2 + 1/2


def _e297097c1afbaa101426(n, section_class):
    # EN 1993-1-1 6.2.9.1(6): Exponents α = β of the biaxial criterion, RHS
    # expression 693b6aa468da87845f2e
    return numpy.select([numpy.greater(section_class, 2),numpy.less_equal(n, 0.8),True], [1,functools.reduce(numpy.minimum, [6, 1.66/(1 - 1.13*n**2)]),6], default=numpy.nan)


def _e53db178f0df8aa8bf1e(E, L, D, D_t):
    # AISC 360-22 Eq. H3-2a: Torsional buckling stress of a round HSS, length-dependent
    # expression 13aaf77b4ecc4782305d
    return 1.23*E/(D_t**(5/4)*numpy.sqrt(L/D))


def _e587df3d3f21d639f524(A, h, t):
    # EN 1993-1-1 6.2.9.1(5): Flange area ratio {a_f} of an RHS
    # expression 547eb829b8d846322511
    return functools.reduce(numpy.minimum, [0.5, (A - 2*h*t)/A])


def _e63a2886bfd78dd3914d(F_cr, A_g):
    # AISC 360-22 Eq. E3-1: Nominal compressive strength, flexural buckling
    # expression 770850eca8da6495e97c
    return A_g*F_cr


def _e890ca6105179489bc6d(C_mLT, lambda_z, n_z, section_class):
    # EN 1993-1-1 Annex B, Table B.2: Interaction factor {k_zy}, torsional deformation
    # expression aed897c6603e1a9b5064
    return numpy.select([numpy.greater(section_class, 2),numpy.less(lambda_z, 0.4),True], [functools.reduce(numpy.maximum, [-0.05*n_z/(C_mLT - 0.25) + 1, -0.05*lambda_z*n_z/(C_mLT - 0.25) + 1]),functools.reduce(numpy.minimum, [lambda_z + 0.6, -0.1*lambda_z*n_z/(C_mLT - 0.25) + 1]),functools.reduce(numpy.maximum, [-0.1*n_z/(C_mLT - 0.25) + 1, -0.1*lambda_z*n_z/(C_mLT - 0.25) + 1])], default=numpy.nan)


def _e9005154ba1cc20e7f9d(Phi, lambda_rel):
    # EN 1993-1-1 Eq. (6.49): Reduction factor for flexural buckling
    # expression 4d5e37c65134456daf08
    return functools.reduce(numpy.minimum, [1, (Phi + numpy.sqrt(Phi**2 - lambda_rel**2))**(-1.0)])


def _e91f01b2d900bb4a7585(k_c, lambda_LT):
    # EN 1993-1-1 6.3.2.3(2): Modification factor f for the moment distribution
    # expression 343b7ece5a462d0489a1
    return functools.reduce(numpy.minimum, [1, -1/2*(1 - k_c)*(1 - 2*(lambda_LT - 0.8)**2) + 1])


def _edbb1cf778d17c809671(E, I, L_cr):
    # EN 1993-1-1 6.3.1.2(1): Elastic critical force for flexural buckling
    # expression d5fc9885df801ff972ed
    return numpy.pi**2*E*I/L_cr**2


def _ee94078680be5d47a4c4(M_p, F_y, S_x, lam, lam_pf, lam_rf, E, k_c):
    # AISC 360-22 Eq. F3-1, F3-2: Nominal flexural strength, flange local buckling
    # expression 7673888dbae4f34b7089
    return numpy.select([numpy.less_equal(lam, lam_rf),True], [M_p - (lam - lam_pf)*(-0.7*F_y*S_x + M_p)/(-lam_pf + lam_rf),0.9*E*S_x*k_c/lam**2], default=numpy.nan)


def _eeca7a3d7b6567fb4b98(F_y, F_e):
    # AISC 360-22 Eq. E3-2, E3-3: Critical stress for flexural buckling
    # expression 15f142db5f16997c16d9
    return numpy.select([numpy.less_equal(F_y/F_e, 2.25),True], [0.658**(F_y/F_e)*F_y,0.877*F_e], default=numpy.nan)


def _ef34a82ac99a69aef98c(b, h, t, R_m):
    # EN 10210-2:2006 and EN 10219-2:2006 Annex B (A_h): Area enclosed by the mid-line of the wall, rectangular hollow section
    # expression f17fc1f3de102ca772c0
    return -R_m**2*(4 - numpy.pi) + (b - t)*(h - t)


def _f0a86e9b98d8941a37cd(A_net, f_u, gamma_M2):
    # EN 1993-1-1 Eq. (6.7): Ultimate resistance of the net section
    # expression 23b3e31a231be6b34c0c
    return 0.9*A_net*f_u/gamma_M2


def _f11f4de17926e2ed99c3(r):
    # EN 1993-1-1 Annex A, Table A.2: {C_mi_0} for a central point load
    # expression e81119fa9125bdc416f1
    return 0.03*r + 1


def _f4d44b74cf6db0627141(rho, f_y):
    # EN 1993-1-1 6.2.8(3): Yield strength reduced for shear
    # expression 906cc9b7326bd407e2a2
    return f_y*(1 - rho)


def _f5de8a058e2decb30845(a_LT, lambda_0, lambda_z, M_y_Ed, C_my, chi_LT, M_pl_y_Rd):
    # EN 1993-1-1 Annex A, Table A.1: Auxiliary term {c_LT}
    # expression b800764b2b4f7e736507
    return 10*a_LT*lambda_0**2*abs(M_y_Ed)/(C_my*M_pl_y_Rd*chi_LT*(lambda_z**4 + 5))


def _f6b02223669d6f75c5f3(E, r_y, J, A_g, M_p):
    # AISC 360-22 Eq. F7-12: Limiting laterally unbraced length for yielding
    # expression 57bb8f8297635007d9b2
    return 0.13*E*r_y*numpy.sqrt(A_g*J)/M_p


def _f7864ccbfd7183e7d6e3(c_t, limit_1, limit_2, limit_3):
    # EN 1993-1-1 Table 5.2: Class of a part from its c/t ratio and the three limits
    # expression fb0573ff322c9c6113c8
    return numpy.select([numpy.less_equal(c_t, limit_1),numpy.less_equal(c_t, limit_2),numpy.less_equal(c_t, limit_3),True], [1,2,3,4], default=numpy.nan)


def _f917ea69bfb89b1e45ea(E, F_y):
    # AISC 360-22 Table B4.1b Case 17: Limit λp, flange of a rectangular HSS, flexure
    # expression 3dd3202a8c28b52cb272
    return 1.12*numpy.sqrt(E/F_y)


def _fa84d9109a5d7b77b12c(eps):
    # EN 1993-1-1 Table 5.2 (sheet 2): Class 2 limit of an outstand in compression
    # expression 13ef280319349a572351
    return 10*eps


def _faf673a8242788c3c8cd(eps):
    # EN 1993-1-1 Table 5.2 (sheet 3): Class 2 limit of a tube, d/t ≤ 70ε²
    # expression ae71aaa64bbb7c595492
    return 70*eps**2


def _fb56059f97a8bceaa33b(B, H, t):
    # AISC 360-22 Section H3.1, User Note: Torsional constant of a rectangular HSS
    # expression c380faef19ad693e0db2
    return -t**3*(18.0 - 4.5*numpy.pi) + t*(2*B - 2*t)*(H - t)


def _fd106af85ef5085d0867(W_y, f_y, M_cr):
    # EN 1993-1-1 6.3.2.2(1): Non-dimensional slenderness for lateral-torsional buckling
    # expression 5dbf5128df6ef63fee29
    return numpy.sqrt(W_y*f_y/M_cr)


def _ff2749f70c667f0eac44(V_rx, V_ry):
    # : Resultant shear (a round HSS resists shear alike in every direction)
    # expression cf31d720b242fe13da62
    return numpy.sqrt(V_rx**2 + V_ry**2)


FUNCTIONS = {
    "00a0df0414000edad7d0": _00a0df0414000edad7d0,
    "014350b74fb2e48aa90f": _014350b74fb2e48aa90f,
    "027b898f729662e1ec84": _027b898f729662e1ec84,
    "02d03cf6ab306ddea859": _02d03cf6ab306ddea859,
    "035c0d914bb25ec7f5ce": _035c0d914bb25ec7f5ce,
    "051314e3339b1ec40ef1": _051314e3339b1ec40ef1,
    "064757b2a5030b696d34": _064757b2a5030b696d34,
    "06cfbc34383808f9918d": _06cfbc34383808f9918d,
    "089986e6cbb4712a4c06": _089986e6cbb4712a4c06,
    "08d7dc40d9f8eccf5cb2": _08d7dc40d9f8eccf5cb2,
    "099f5a92aad7b72b802a": _099f5a92aad7b72b802a,
    "0abcf4569f948ff63b67": _0abcf4569f948ff63b67,
    "0adf476e694febdd65ef": _0adf476e694febdd65ef,
    "1065ebafe9d0406926f1": _1065ebafe9d0406926f1,
    "10dd47ff3bf0334c5f98": _10dd47ff3bf0334c5f98,
    "12de56c4824687d6344b": _12de56c4824687d6344b,
    "14e8f8d45ab0ec3f8110": _14e8f8d45ab0ec3f8110,
    "162bff335d15c64dd5ec": _162bff335d15c64dd5ec,
    "16d2e3a76315b11b035a": _16d2e3a76315b11b035a,
    "18093701ba6af73f1e51": _18093701ba6af73f1e51,
    "1bac423d00a775e682c5": _1bac423d00a775e682c5,
    "1c2783bbded1c5ead865": _1c2783bbded1c5ead865,
    "1c9f1650b76e484a0dca": _1c9f1650b76e484a0dca,
    "1decd329c05d71bf5d0d": _1decd329c05d71bf5d0d,
    "1e0cdf3fb7a8cc8840ff": _1e0cdf3fb7a8cc8840ff,
    "1e5fb128d2ac1a5557aa": _1e5fb128d2ac1a5557aa,
    "20976ff9092632ebd881": _20976ff9092632ebd881,
    "214ef4b3ac9b1afa4a01": _214ef4b3ac9b1afa4a01,
    "22e53b0c6d167e7635c4": _22e53b0c6d167e7635c4,
    "22f0a22a1d412da352e1": _22f0a22a1d412da352e1,
    "23171e67a033b3a49780": _23171e67a033b3a49780,
    "258848dbdc25a51bdbfe": _258848dbdc25a51bdbfe,
    "271cee536b13a0021df0": _271cee536b13a0021df0,
    "27dc689f173292b711f5": _27dc689f173292b711f5,
    "2849cee110596e703bb8": _2849cee110596e703bb8,
    "2a3a4952d025e541bc8c": _2a3a4952d025e541bc8c,
    "2b12a2220bce94c6e2e6": _2b12a2220bce94c6e2e6,
    "2b716ad4aa8ffaa35003": _2b716ad4aa8ffaa35003,
    "2bb71fcd792abc81cc33": _2bb71fcd792abc81cc33,
    "2bde56bed6e23b72e999": _2bde56bed6e23b72e999,
    "2c7e1059e879939c46c6": _2c7e1059e879939c46c6,
    "2e20ca5d1ad280b112be": _2e20ca5d1ad280b112be,
    "2f017dc2a0409eaf832f": _2f017dc2a0409eaf832f,
    "2fca0588d8c734e7a6ad": _2fca0588d8c734e7a6ad,
    "3078f856876962e622f0": _3078f856876962e622f0,
    "30e18a8c76376011cf84": _30e18a8c76376011cf84,
    "31083cd2ee307a6fc2f0": _31083cd2ee307a6fc2f0,
    "31e534460627237d0901": _31e534460627237d0901,
    "3291f1c639f3b2629103": _3291f1c639f3b2629103,
    "34505fae50ead40a6ebb": _34505fae50ead40a6ebb,
    "34d36e5b7ebacfd877bc": _34d36e5b7ebacfd877bc,
    "3652991feed9a791d723": _3652991feed9a791d723,
    "384f6e71f7f7fe21646e": _384f6e71f7f7fe21646e,
    "39a0063a170918b115d2": _39a0063a170918b115d2,
    "3a79fb2edff5bd0b68de": _3a79fb2edff5bd0b68de,
    "3ac74121876738f136bf": _3ac74121876738f136bf,
    "3c09c6f13ec3b00d1c77": _3c09c6f13ec3b00d1c77,
    "3c7ebd3189d3c028c5f5": _3c7ebd3189d3c028c5f5,
    "3cd33a9bd738ee808e76": _3cd33a9bd738ee808e76,
    "3ed5b3bc7cf73a850e6e": _3ed5b3bc7cf73a850e6e,
    "408dd13706027d1a8a74": _408dd13706027d1a8a74,
    "43b926b1519038a96584": _43b926b1519038a96584,
    "44665f0069b4b12e97fe": _44665f0069b4b12e97fe,
    "44856750aab618fce045": _44856750aab618fce045,
    "45f91c8b2282b65bb33a": _45f91c8b2282b65bb33a,
    "46da740437d2a0e6081c": _46da740437d2a0e6081c,
    "48cf1504573184e3e7c3": _48cf1504573184e3e7c3,
    "4c04d8ff8d3aeb264672": _4c04d8ff8d3aeb264672,
    "4c572a4a891be19ac5bf": _4c572a4a891be19ac5bf,
    "4d310390b2d67881c8e4": _4d310390b2d67881c8e4,
    "4d33f7a11b29c455b519": _4d33f7a11b29c455b519,
    "50e61967187a168d41ce": _50e61967187a168d41ce,
    "514514abf910387e709d": _514514abf910387e709d,
    "519cd80a4246de1e3c56": _519cd80a4246de1e3c56,
    "51eb14d82e6b56ad9974": _51eb14d82e6b56ad9974,
    "5259b436203124c10c93": _5259b436203124c10c93,
    "533bc9d5fdbcd0e261e8": _533bc9d5fdbcd0e261e8,
    "55203b5f614e26ba2a23": _55203b5f614e26ba2a23,
    "589d0ad57d94b60f4c8c": _589d0ad57d94b60f4c8c,
    "5a523d462bc085a715c9": _5a523d462bc085a715c9,
    "5bc1ed79f22254e3c72a": _5bc1ed79f22254e3c72a,
    "601dfd4344d06680c615": _601dfd4344d06680c615,
    "618cfafff2ca199e5f53": _618cfafff2ca199e5f53,
    "624f39d77712b8a7a38f": _624f39d77712b8a7a38f,
    "627bb76523d2d07c3e1f": _627bb76523d2d07c3e1f,
    "639c5e4d319ab4fb24e2": _639c5e4d319ab4fb24e2,
    "6498b7fab63f89a9851e": _6498b7fab63f89a9851e,
    "66a39b40f967fff16a4f": _66a39b40f967fff16a4f,
    "6717a9cc3d66fbede095": _6717a9cc3d66fbede095,
    "69e42f02943e8bb4e4ba": _69e42f02943e8bb4e4ba,
    "6b59ee406761b4ca5566": _6b59ee406761b4ca5566,
    "6c14c7afc0b04bc53981": _6c14c7afc0b04bc53981,
    "6f1b5550e44f0984e61d": _6f1b5550e44f0984e61d,
    "72354d9a1abc03a1830f": _72354d9a1abc03a1830f,
    "727e3cad30667bd7502f": _727e3cad30667bd7502f,
    "75c4563aad20d6a60e7e": _75c4563aad20d6a60e7e,
    "7706b88a8c1199acc1fb": _7706b88a8c1199acc1fb,
    "787f9f09962f2d316ef5": _787f9f09962f2d316ef5,
    "7891655c24b497d7b0b5": _7891655c24b497d7b0b5,
    "7b4656f4ad858bdda0b9": _7b4656f4ad858bdda0b9,
    "815c301704bf0d8e1cd5": _815c301704bf0d8e1cd5,
    "81e10ae4b43b376ab6b4": _81e10ae4b43b376ab6b4,
    "835c5007267a8446fffb": _835c5007267a8446fffb,
    "83ef9733f5073f1f1857": _83ef9733f5073f1f1857,
    "8579c9d60769d3a8d29c": _8579c9d60769d3a8d29c,
    "87335147d7601893e884": _87335147d7601893e884,
    "879c54f807c51e5b74f0": _879c54f807c51e5b74f0,
    "87b62a9aad812fcaffa0": _87b62a9aad812fcaffa0,
    "8ac035390de41c3926bb": _8ac035390de41c3926bb,
    "8afc53eed18ffccc9c02": _8afc53eed18ffccc9c02,
    "8b0a3edbcdf2b3e765fd": _8b0a3edbcdf2b3e765fd,
    "8d744ebacd65536bc32c": _8d744ebacd65536bc32c,
    "8faef24ad81d91963278": _8faef24ad81d91963278,
    "92567c67f1ace904d72b": _92567c67f1ace904d72b,
    "92f6cca6f37c3f85a98d": _92f6cca6f37c3f85a98d,
    "95241162cab57d594696": _95241162cab57d594696,
    "95f71cf0b5c5f5fc55d1": _95f71cf0b5c5f5fc55d1,
    "96a0e1910a0ca2e6b47c": _96a0e1910a0ca2e6b47c,
    "97ae6723f6e395407bd4": _97ae6723f6e395407bd4,
    "97c77636158bd94555f5": _97c77636158bd94555f5,
    "97f5c5ec9cbed96c94cc": _97f5c5ec9cbed96c94cc,
    "98bda609bd77f4f3ad7d": _98bda609bd77f4f3ad7d,
    "99609295bc094468c016": _99609295bc094468c016,
    "9a57fb3ce9b2d0889950": _9a57fb3ce9b2d0889950,
    "9ce49b98ae83701bade0": _9ce49b98ae83701bade0,
    "9e4af35594526d778540": _9e4af35594526d778540,
    "9f08219dfc3a878011a8": _9f08219dfc3a878011a8,
    "9f29896432f672ab8b4b": _9f29896432f672ab8b4b,
    "a01ca54322030a0235f1": _a01ca54322030a0235f1,
    "a4981c67240bce03cc81": _a4981c67240bce03cc81,
    "a53ff0c576f5e3706dc2": _a53ff0c576f5e3706dc2,
    "abcd62f588d858168019": _abcd62f588d858168019,
    "ac130d50381924e62236": _ac130d50381924e62236,
    "ac2cce500bb9f9473b01": _ac2cce500bb9f9473b01,
    "ad53b22d8e0b08f7ff1a": _ad53b22d8e0b08f7ff1a,
    "adf237c4ca007462e211": _adf237c4ca007462e211,
    "ae9ef52d2817878b2e18": _ae9ef52d2817878b2e18,
    "af7659c74651c5b9bd4c": _af7659c74651c5b9bd4c,
    "af961b31dcfe5cdaec58": _af961b31dcfe5cdaec58,
    "b1f4e73d2c6f47dfbf0a": _b1f4e73d2c6f47dfbf0a,
    "b4363fd7287a59f6797d": _b4363fd7287a59f6797d,
    "b60f3b3772f0c207f24e": _b60f3b3772f0c207f24e,
    "b6b2229bc2f2f642d8ca": _b6b2229bc2f2f642d8ca,
    "b84177f2dc6d2a3733ae": _b84177f2dc6d2a3733ae,
    "ba1433fc51b94a3f5966": _ba1433fc51b94a3f5966,
    "ba4ca434718b6d9e923b": _ba4ca434718b6d9e923b,
    "bc452a7cd30d6d519593": _bc452a7cd30d6d519593,
    "bd93fd2bc7eff38e5fe7": _bd93fd2bc7eff38e5fe7,
    "c032b3011077b89fa653": _c032b3011077b89fa653,
    "c0f6e5e77cdcb251f7cd": _c0f6e5e77cdcb251f7cd,
    "c10d63b98496badca91a": _c10d63b98496badca91a,
    "c183c7febd0abbaa2526": _c183c7febd0abbaa2526,
    "c2351e51a2ebaf10ca12": _c2351e51a2ebaf10ca12,
    "c4e29e702f9204e918de": _c4e29e702f9204e918de,
    "c660ff90829afe01e978": _c660ff90829afe01e978,
    "c6e176136677cf461d73": _c6e176136677cf461d73,
    "c79722bdf79a3591bc10": _c79722bdf79a3591bc10,
    "cac2c12a2910e5a71328": _cac2c12a2910e5a71328,
    "cc63d99051ca0078d356": _cc63d99051ca0078d356,
    "cdd01aabd4c18f908303": _cdd01aabd4c18f908303,
    "ced9f646bfb9306d6188": _ced9f646bfb9306d6188,
    "d13bbe9b922aeab20ddc": _d13bbe9b922aeab20ddc,
    "d45bbac482182b0ed550": _d45bbac482182b0ed550,
    "d489e538056e9cf36996": _d489e538056e9cf36996,
    "d616960ce50a32281973": _d616960ce50a32281973,
    "d6c1b26e7d309b505739": _d6c1b26e7d309b505739,
    "d87bc1d24097dd330d52": _d87bc1d24097dd330d52,
    "d96b46343ca79e1ef153": _d96b46343ca79e1ef153,
    "db4c3cbc3242f2d66706": _db4c3cbc3242f2d66706,
    "db61c54a10a0b86b8021": _db61c54a10a0b86b8021,
    "db95a24dcf7cb0f4f617": _db95a24dcf7cb0f4f617,
    "dc49fe9512f63d09a07c": _dc49fe9512f63d09a07c,
    "dd7cbefdb56bddcc1a12": _dd7cbefdb56bddcc1a12,
    "ddae9f88d66fb4c939c7": _ddae9f88d66fb4c939c7,
    "de654250a912c31dbf0f": _de654250a912c31dbf0f,
    "df95e87b0b0e11d6d85f": _df95e87b0b0e11d6d85f,
    "e09cce2008cc484b0d6a": _e09cce2008cc484b0d6a,
    "e0aa9fd8c02541de0735": _e0aa9fd8c02541de0735,
    "e0d84e9e2ffca6d42559": _e0d84e9e2ffca6d42559,
    "e297097c1afbaa101426": _e297097c1afbaa101426,
    "e53db178f0df8aa8bf1e": _e53db178f0df8aa8bf1e,
    "e587df3d3f21d639f524": _e587df3d3f21d639f524,
    "e63a2886bfd78dd3914d": _e63a2886bfd78dd3914d,
    "e890ca6105179489bc6d": _e890ca6105179489bc6d,
    "e9005154ba1cc20e7f9d": _e9005154ba1cc20e7f9d,
    "e91f01b2d900bb4a7585": _e91f01b2d900bb4a7585,
    "edbb1cf778d17c809671": _edbb1cf778d17c809671,
    "ee94078680be5d47a4c4": _ee94078680be5d47a4c4,
    "eeca7a3d7b6567fb4b98": _eeca7a3d7b6567fb4b98,
    "ef34a82ac99a69aef98c": _ef34a82ac99a69aef98c,
    "f0a86e9b98d8941a37cd": _f0a86e9b98d8941a37cd,
    "f11f4de17926e2ed99c3": _f11f4de17926e2ed99c3,
    "f4d44b74cf6db0627141": _f4d44b74cf6db0627141,
    "f5de8a058e2decb30845": _f5de8a058e2decb30845,
    "f6b02223669d6f75c5f3": _f6b02223669d6f75c5f3,
    "f7864ccbfd7183e7d6e3": _f7864ccbfd7183e7d6e3,
    "f917ea69bfb89b1e45ea": _f917ea69bfb89b1e45ea,
    "fa84d9109a5d7b77b12c": _fa84d9109a5d7b77b12c,
    "faf673a8242788c3c8cd": _faf673a8242788c3c8cd,
    "fb56059f97a8bceaa33b": _fb56059f97a8bceaa33b,
    "fd106af85ef5085d0867": _fd106af85ef5085d0867,
    "ff2749f70c667f0eac44": _ff2749f70c667f0eac44,
}
