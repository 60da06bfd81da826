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
    'systems, J. Chem. Eng. Data 46, 1086–1088: hexane to dodecane against water by the emergent-drop method, ' +
    '10–60 °C, with a correlation in temperature and carbon number (first page read; tables not read).',
  doi: '10.1021/je000245r',
};

export const WU_HORNOF_1999: Reference = {
  key: 'wu-hornof1999',
  citation:
    'D. Wu, V. Hornof (1999), Dynamic interfacial tension in hexadecane/water systems containing ready-made ' +
    'and in-situ-formed surfactants, Chem. Eng. Commun. 172, 85–106: for pure hexadecane/water, with hexadecane ' +
    'as the drop phase, the measured interfacial tension was very close to the published value, 53.5 mN/m ' +
    '(abstract read).',
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

/**
 * The open-source transcription through which several handbook tables below
 * were read (the printed pages were not available); digits were compared
 * with the catalogue's coefficients one by one.
 */
const VIA_CHEMICALS =
  'as transcribed in the open-source chemicals library (C. Bell et al., Chemical Engineering Design Library), ' +
  'not re-checked against the printed page';

export const PDMS_FLUID_DATA: Reference = {
  key: 'pdms-fluid-datasheet',
  citation:
    'Typical properties of linear trimethylsiloxy-terminated polydimethylsiloxane fluids by nominal ' +
    "viscosity grade, as printed in silicone suppliers' product information (values at 25 °C; recalled, " +
    'not re-read).',
};

export const MELINDER_2010: Reference = {
  key: 'melinder2010',
  citation:
    'Å. Melinder (2010), Properties of Secondary Working Fluids for Indirect Systems, IIF-IIR, Paris: ' +
    'polydimethylsiloxane heat-transfer fluid no. 1 (about 3 mm²/s at 25 °C), density, heat capacity, ' +
    'viscosity and thermal conductivity from −80 to 100 °C; fit coefficients as transcribed in the CoolProp ' +
    'incompressible-liquid library (I. H. Bell, J. Wronski et al.), not re-checked against the printed page.',
};

export const DARHUBER_2003: Reference = {
  key: 'darhuber2003',
  citation:
    'Surface tension of liquid polydimethylsiloxane, empirical fit to available data γ = 21.5 − 0.06·t mN/m ' +
    '(t in °C, 0–100 °C), attributed to A. A. Darhuber et al. (2003) in G. Karniadakis, A. Beskok, N. Aluru ' +
    '(2005), Microflows and Nanoflows: Fundamentals and Simulation, Springer, Interdisciplinary Applied ' +
    'Mathematics 29, section on surface tension (that passage read; the 2003 paper it names was not identified, ' +
    'so it is cited through the book).',
};

export const PFPE_FLUID_DATA: Reference = {
  key: 'pfpe-fluid-datasheet',
  citation:
    'Typical properties of a poly(hexafluoropropylene oxide) perfluoropolyether oil of about 80 mm²/s at ' +
    "20 °C, as printed in suppliers' product information (recalled, not re-read); the lubricant class used " +
    'for slippery liquid-infused porous surfaces by T.-S. Wong et al. (2011), Nature 477, 443–447.',
  doi: '10.1038/nature10447',
};

export const PACANSKY_WALTMAN_1997: Reference = {
  key: 'pacansky-waltman1997',
  citation:
    'J. Pacansky, R. J. Waltman (1997), The effect of Lewis-acid catalysis on the decomposition of CF3OCF3 to ' +
    'COF2 and CF4, J. Fluorine Chem. 83, 41–45: the catalytically enhanced degradation of perfluorinated ether ' +
    'lubricants on aluminium fluoride, products carbonyl fluoride and tetrafluoromethane (abstract read).',
};

export const PERFLUORODECALIN_DATA: Reference = {
  key: 'perfluorodecalin-data',
  citation:
    "Perfluorodecalin (C10F18, mixture of cis and trans isomers): typical properties from chemical suppliers' " +
    'catalogue data (recalled, not re-read).',
};

export const MINERAL_OIL_DATA: Reference = {
  key: 'mineral-oil-light-data',
  citation:
    "Light white mineral oil (paraffinum liquidum, light grade): typical properties from suppliers' " +
    'product specifications (density at 25 °C; kinematic viscosity grade; recalled, not re-read).',
};

export const USP_LIGHT_MINERAL_OIL: Reference = {
  key: 'usp32-light-mineral-oil',
  citation:
    'United States Pharmacopeia 32 – National Formulary 27 (2009), monograph Topical Light Mineral Oil (Light ' +
    'Mineral Oil suitably packaged): specific gravity between 0.818 and 0.880; kinematic viscosity between 3.0 ' +
    'and 34.4 mm²/s at 40.0 °C (capillary viscometer). Read in the drugfuture.com reproduction of the monograph.',
};

const CRC_2014 = 'W. M. Haynes (ed.) (2014), CRC Handbook of Chemistry and Physics, 95th ed., CRC Press';

export const CRC_ORGANIC_CONSTANTS: Reference = {
  key: 'crc2014-organic-constants',
  citation: `${CRC_2014}, Section 3, Physical Constants of Organic Compounds (melting and normal boiling points), ${VIA_CHEMICALS}.`,
};

export const CRC_INORGANIC_CONSTANTS: Reference = {
  key: 'crc2014-inorganic-constants',
  citation: `${CRC_2014}, Section 4, Physical Constants of Inorganic Compounds (melting point, boiling point, solid density), ${VIA_CHEMICALS}.`,
};

export const CRC_MOLTEN_DENSITY: Reference = {
  key: 'crc2014-molten-density',
  citation: `${CRC_2014}, Section 4, density of molten elements, ρ = ρ_m − k (T − T_m), ${VIA_CHEMICALS}.`,
};

export const JANAF_1998: Reference = {
  key: 'janaf1998',
  citation:
    `M. W. Chase Jr. (1998), NIST-JANAF Thermochemical Tables, 4th ed., J. Phys. Chem. Ref. Data Monograph 9: ` +
    `gallium, liquid phase, heat capacity table, ${VIA_CHEMICALS}.`,
};

/**
 * The open-source transcription through which the liquid-metal reference correlations below were read:
 * the thermolib package (liquid_metal module: density, viscosity and thermal-conductivity coefficient
 * tables). Its mercury viscosity coefficients (a₁ = 0.2561, a₂ = 132.29 K) agree with an independent
 * reading of Table 5 of Assael et al. (2012), which supports the transcription of that table.
 */
const VIA_THERMOLIB =
  'coefficients and temperature ranges as transcribed in the open-source thermolib package (liquid_metal module), ' +
  'not re-checked against the printed tables';

export const ASSAEL_2012: Reference = {
  key: 'assael2012-liquid-metals',
  citation:
    'M. J. Assael, I. J. Armyra, J. Brillo, S. V. Stankus, J. Wu, W. A. Wakeham (2012), Reference data for the ' +
    'density and viscosity of liquid cadmium, cobalt, gallium, indium, mercury, silicon, thallium, and zinc, ' +
    'J. Phys. Chem. Ref. Data: gallium density ρ = 6077 − 0.611 (T − 302.914 K) kg/m³ (303–1500 K, ' +
    'uncertainty 0.4 %) and viscosity log₁₀(η/mPa·s) = −0.4465 + 204.03 K/T (Eq. 2, Table 5; 304–800 K, ' +
    `uncertainty 13.5 %), ${VIA_THERMOLIB}. Title, authors, year, journal, DOI and the uncertainties read in the ` +
    'scholar.archive.org record of the paper (volume and article number not shown there, so not given here).',
  doi: '10.1063/1.4729873',
};

export const ASSAEL_2017: Reference = {
  key: 'assael2017-liquid-metal-conductivity',
  citation:
    'M. J. Assael, A. Chatzimichailidis, K. D. Antoniadis, W. A. Wakeham, M. L. Huber, H. Fukuyama (2017), ' +
    'Reference correlations for the thermal conductivity of liquid copper, gallium, indium, iron, lead, nickel ' +
    'and tin, High Temp. High Press. 46, 391–416 (NIST author manuscript, PubMed Central PMC5772911): gallium ' +
    'λ = 28.403 + 0.071896 (T − 302.914 K) W/(m·K), 303–850 K, uncertainty 15.9 % at 95 % confidence, ' +
    `${VIA_THERMOLIB}.`,
};

export const GALLIUM_OXIDE_SKIN: Reference = {
  key: 'xu2012-gallium-oxide',
  citation:
    'Q. Xu, N. Oudalov, Q. Guo, H. M. Jaeger, E. Brown (2012), Effect of oxidation on the mechanical ' +
    'properties of liquid gallium and eutectic gallium-indium, arXiv:1201.4828 (title, authors and abstract ' +
    'read; the journal version is not cited because no record of it was read): in air or neutral water an ' +
    'oxide skin gives a yield stress and a surface stress that mimics surface tension, so apparent surface ' +
    'tensions and contact angles depend on ' +
    'the oxidation state.',
};

export const IEC_60079_20_1: Reference = {
  key: 'iec60079-20-1-2010',
  citation:
    'IEC 60079-20-1:2010, Explosive atmospheres – Part 20-1: Material characteristics for gas and vapour ' +
    `classification – Test methods and data (flash points), ${VIA_CHEMICALS}.`,
};

export const SERAT_2017: Reference = {
  key: 'serat2017',
  citation:
    'F. Z. Serat, A. M. Benkouider, A. Yahiaoui, F. Bagui (2017), Nonlinear group contribution model for ' +
    'the prediction of flash points using normal boiling points, Fluid Phase Equilib. 449, 52–59: its ' +
    `DIPPR-evaluated experimental flash points, ${VIA_CHEMICALS}.`,
  doi: '10.1016/j.fluid.2017.06.008',
};

export const ASTM_D7094_DODECANE: Reference = {
  key: 'astm-d7094-dodecane',
  citation:
    'ASTM D7094, Standard test method for flash point by modified continuously closed cup (MCCCFP) tester, ' +
    'Table X1.1: n-dodecane 78.6 °C; as quoted in a flash-point study record of a REACH registration dossier ' +
    '(European Chemicals Agency, registered dossier 30749, section 4.12), whose Pensky–Martens closed-cup check ' +
    'of n-dodecane (ASTM D93) gave 77.5 °C. The standard itself was not read.',
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

export const ROSEN_KUNJAPPU_2012: Reference = {
  key: 'rosen2012',
  citation:
    'Rosen, M. J. & Kunjappu, J. T. (2012). Surfactants and Interfacial Phenomena, 4th ed. Wiley, Hoboken NJ ' +
    '(DOI and ISBN 978-1-118-22892-0 as recorded in the SurfPro bibliography, surfpro-2025).',
  doi: '10.1002/9781118228920',
};

/**
 * A curated surfactant database read as a data file: the row of each surfactant names the publications its values
 * come from, and the catalogue note repeats them.
 */
export const SURFPRO_2025: Reference = {
  key: 'surfpro-2025',
  citation:
    'Hödl, S. L., Hermans, L., Dankloff, P. F. J., Piruska, A., Huck, W. T. S. & Robinson, W. E. (2025). SurfPro — ' +
    'a curated database and predictive model of experimental properties of surfactants. Digital Discovery 4(5), ' +
    '1176–1187; values read in its data file data/surfpro_literature.csv (SurfProV2, public repository ' +
    'BigChemistry-RobotLab/SurfPro, commit eb9a1ac), which gives for each surfactant the critical micelle ' +
    'concentration, the maximum surface excess Γ_max and the surface pressure at the CMC, with the temperature ' +
    'and the DOI of the publication each value was taken from.',
};

export const IUPAC_ATOMIC_WEIGHTS_1995: Reference = {
  key: 'iupac-atomic-weights-1995',
  citation:
    'Coplen, T. B. (1996). Atomic weights of the elements 1995 (IUPAC Technical Report). Pure and Applied ' +
    'Chemistry 68(12), 2339–2359, Table 2 (C 12.0107, H 1.00794, O 15.9994, Na 22.989770, S 32.066). Molar ' +
    'masses of the catalogue surfactants are computed from their formulas with these weights.',
};
