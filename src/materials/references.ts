/**
 * Sources of the catalogue's values (fluid properties and surfactant
 * adsorption data). One entry per publication; the `key` is what
 * `FluidState.origins` and the listings report. The literature of the models
 * lives in src/core/references.ts; no key is defined in both.
 */
import type { Reference } from '../core/references.js';

export const IAPWS_SR6_08: Reference = {
  key: 'iapws-sr6-08',
  citation:
    'IAPWS SR6-08(2011), Revised Supplementary Release on Properties of Liquid Water at 0.1 MPa; ' +
    'after J. Pátek, J. Hrubý, J. Klomfar, M. Součková, A. H. Harvey (2009), Reference correlations for ' +
    'thermophysical properties of liquid water at 0.1 MPa, J. Phys. Chem. Ref. Data 38, 21–29.',
  doi: '10.1063/1.3043575',
};

export const IAPWS_VISCOSITY_2008: Reference = {
  key: 'iapws-r12-08',
  citation:
    'IAPWS R12-08, Release on the IAPWS Formulation 2008 for the Viscosity of Ordinary Water Substance; ' +
    'M. L. Huber, R. A. Perkins, A. Laesecke, D. G. Friend, J. V. Sengers, M. J. Assael, I. N. Metaxa, ' +
    'E. Vogel, R. Mareš, K. Miyagawa (2009), J. Phys. Chem. Ref. Data 38, 101–125.',
  doi: '10.1063/1.3088050',
};

export const IAPWS_CONDUCTIVITY_2011: Reference = {
  key: 'iapws-r15-11',
  citation:
    'IAPWS R15-11, Release on the IAPWS Formulation 2011 for the Thermal Conductivity of Ordinary Water ' +
    'Substance; M. L. Huber, R. A. Perkins, D. G. Friend, J. V. Sengers, M. J. Assael, I. N. Metaxa, ' +
    'K. Miyagawa, R. Hellmann, E. Vogel (2012), J. Phys. Chem. Ref. Data 41, 033102.',
  doi: '10.1063/1.4738955',
};

export const IAPWS_SURFACE_TENSION_2014: Reference = {
  key: 'iapws-r1-76-2014',
  citation:
    'IAPWS R1-76(2014), Revised Release on Surface Tension of Ordinary Water Substance; after ' +
    'N. B. Vargaftik, B. N. Volkov, L. D. Voljak (1983), International tables of the surface tension of ' +
    'water, J. Phys. Chem. Ref. Data 12, 817–820.',
  doi: '10.1063/1.555688',
};

export const UNESCO_EOS80: Reference = {
  key: 'millero-poisson1981',
  citation:
    'F. J. Millero, A. Poisson (1981), International one-atmosphere equation of state of seawater, ' +
    'Deep-Sea Res. 28A, 625–629; as EOS-80 in N. P. Fofonoff, R. C. Millard (1983), Algorithms for ' +
    'computation of fundamental properties of seawater, UNESCO Tech. Pap. Mar. Sci. 44.',
  doi: '10.1016/0198-0149(81)90122-9',
};

export const TEOS10_SALINITY: Reference = {
  key: 'teos10-2010',
  citation:
    'IOC, SCOR, IAPSO (2010), The international thermodynamic equation of seawater – 2010 (TEOS-10), ' +
    'Intergovernmental Oceanographic Commission, Manuals and Guides 56 (reference-composition ' +
    'salinity S_R = (35.16504/35) g/kg × S_P, used here as absolute salinity).',
};

export const SHARQAWY_2010: Reference = {
  key: 'sharqawy2010',
  citation:
    'M. H. Sharqawy, J. H. Lienhard V, S. M. Zubair (2010), Thermophysical properties of seawater: a ' +
    'review of existing correlations and data, Desalination and Water Treatment 16, 354–380.',
  doi: '10.5004/dwt.2010.1079',
};

export const JASPER_1972: Reference = {
  key: 'jasper1972',
  citation:
    'J. J. Jasper (1972), The surface tension of pure liquid compounds, J. Phys. Chem. Ref. Data 1, 841–1010.',
  doi: '10.1063/1.3253106',
};

export const ZEPPIERI_2001: Reference = {
  key: 'zeppieri2001',
  citation:
    'S. Zeppieri, J. Rodríguez, A. L. López de Ramos (2001), Interfacial tension of alkane + water ' +
    'systems, J. Chem. Eng. Data 46, 1086–1088.',
  doi: '10.1021/je000245r',
};

const PERRY_2008 =
  "D. W. Green, R. H. Perry (eds.) (2008), Perry's Chemical Engineers' Handbook, 8th ed., McGraw-Hill, " +
  'Section 2 (DIPPR 801 correlation coefficients)';

export const PERRY_DENSITY: Reference = {
  key: 'perry2008-table2-32',
  citation: `${PERRY_2008}, Table 2-32: densities of inorganic and organic liquids (DIPPR Eq. 105).`,
};

export const PERRY_VISCOSITY: Reference = {
  key: 'perry2008-table2-313',
  citation: `${PERRY_2008}, Table 2-313: viscosity of inorganic and organic liquids (DIPPR Eq. 101).`,
};

export const PERRY_CONDUCTIVITY: Reference = {
  key: 'perry2008-table2-315',
  citation: `${PERRY_2008}, Table 2-315: thermal conductivity of inorganic and organic liquids (DIPPR Eq. 100).`,
};

export const PERRY_HEAT_CAPACITY: Reference = {
  key: 'perry2008-table2-153',
  citation: `${PERRY_2008}, Table 2-153: heat capacities of inorganic and organic liquids (DIPPR Eq. 100).`,
};

export const PDMS_FLUID_DATA: Reference = {
  key: 'pdms-fluid-datasheet',
  citation:
    'Typical properties of linear polydimethylsiloxane fluids by nominal viscosity grade, as printed in ' +
    "suppliers' product information for 200-series / PMX-200-class silicone fluids (values at 25 °C).",
};

export const PFPE_FLUID_DATA: Reference = {
  key: 'pfpe-fluid-datasheet',
  citation:
    "Typical properties of a perfluoropolyether oil of the Krytox GPL-103 class (viscosity grade ≈ 80 cSt " +
    "at 20 °C), as printed in the supplier's product information and used for slippery liquid-infused " +
    'surfaces by T.-S. Wong et al. (2011), Nature 477, 443–447.',
  doi: '10.1038/nature10447',
};

export const PERFLUORODECALIN_DATA: Reference = {
  key: 'perfluorodecalin-data',
  citation:
    "Perfluorodecalin (C10F18, mixture of cis and trans isomers): typical properties from the chemical " +
    "suppliers' catalogue data and the CRC Handbook (95th ed., 2014) physical-constants table.",
};

export const MINERAL_OIL_DATA: Reference = {
  key: 'mineral-oil-light-data',
  citation:
    "Light white mineral oil (paraffinum liquidum, light grade): typical properties from suppliers' " +
    'product specifications (density at 25 °C; kinematic viscosity grade).',
};

export const CHANG_FRANSES_1995: Reference = {
  key: 'chang1995',
  citation:
    'Chang, C.-H. & Franses, E. I. (1995). Adsorption dynamics of surfactants at the air/water interface: a critical review of mathematical models, data, and mechanisms. Colloids and Surfaces A 100, 1–45.',
  doi: '10.1016/0927-7757(94)03061-4',
};

export const PROSSER_FRANSES_2001: Reference = {
  key: 'prosser2001',
  citation:
    'Prosser, A. J. & Franses, E. I. (2001). Adsorption and surface tension of ionic surfactants at the air–water interface: review and evaluation of equilibrium models. Colloids and Surfaces A 178, 1–40.',
  doi: '10.1016/S0927-7757(00)00706-8',
};

export const MUKERJEE_MYSELS_1971: Reference = {
  key: 'mukerjee1971',
  citation:
    'Mukerjee, P. & Mysels, K. J. (1971). Critical Micelle Concentrations of Aqueous Surfactant Systems. NSRDS-NBS 36, U.S. National Bureau of Standards, Washington DC.',
};

export const ROSEN_KUNJAPPU_2012: Reference = {
  key: 'rosen2012',
  citation: 'Rosen, M. J. & Kunjappu, J. T. (2012). Surfactants and Interfacial Phenomena, 4th ed. Wiley, Hoboken NJ (DOI 10.1002/9781118228920 from memory).',
};
