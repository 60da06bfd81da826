/**
 * The literature the models rest on. Each reference is defined once, here,
 * with its DOI where one exists, and cited by key (`REFERENCES.philip1972`)
 * from every module that uses it. The catalogue's data sources (property
 * tables, data sheets, surfactant compilations) live in
 * src/materials/references.ts; no key appears in both (a test checks).
 *
 * A DOI is given only where it was read on a publisher page, in a
 * Crossref-derived reference list or in the authors' own record. A detail
 * that could not be confirmed against a readable source says so in its
 * citation text, with what was searched; docs/citations-ledger.md holds the
 * verdict for every entry.
 */

export interface Reference {
  /** Short key, e.g. `dean1978`. */
  key: string;
  /** Full citation: authors, year, title, journal, volume, pages. */
  citation: string;
  doi?: string;
}

type Entries = Record<string, Omit<Reference, 'key'>>;

/** Gives every entry its own property name as key, so a key can never disagree with its name. */
function bibliography<T extends Entries>(entries: T): { readonly [K in keyof T]: Reference & { key: K } } {
  return Object.freeze(Object.fromEntries(Object.entries(entries).map(([key, entry]) => [key, Object.freeze({ key, ...entry })]))) as {
    readonly [K in keyof T]: Reference & { key: K };
  };
}

export const REFERENCES = bibliography({
  // --- Limits of the continuum description -------------------------------------------------------
  garajeu2013: {
    citation: 'Gărăjeu, M., Gouin, H., Saccomandi, G. (2013). Scaling Navier–Stokes equation in nanotubes. Physics of Fluids 25, 082003.',
    doi: '10.1063/1.4818159',
  },
  hansen2015: {
    citation: 'Hansen, J. S., Dyre, J. C., Daivis, P., Todd, B. D., Bruus, H. (2015). Continuum nanofluidics. Langmuir 31, 13275–13289.',
  },
  // --- Flow over a smooth wall -------------------------------------------------------------------
  dean1978: {
    citation:
      'Dean, R. B. (1978). Reynolds number dependence of skin friction and other bulk flow variables in two-dimensional rectangular duct flow. J. Fluids Eng. 100(2), 215–223.',
  },
  kim1987: {
    citation: 'Kim, J., Moin, P. & Moser, R. (1987). Turbulence statistics in fully developed channel flow at low Reynolds number. J. Fluid Mech. 177, 133–166.',
    doi: '10.1017/S0022112087000892',
  },
  colebrook1939: {
    citation:
      'Colebrook, C. F. (1939). Turbulent flow in pipes, with particular reference to the transition region between the smooth and rough pipe laws. J. Inst. Civ. Eng. 11(4), 133–156.',
    doi: '10.1680/ijoti.1939.13150',
  },
  haaland1983: {
    citation: 'Haaland, S. E. (1983). Simple and explicit formulas for the friction factor in turbulent pipe flow. J. Fluids Eng. 105(1), 89–90.',
    doi: '10.1115/1.3240948',
  },
  blasius1908: {
    citation: 'Blasius, H. (1908). Grenzschichten in Flüssigkeiten mit kleiner Reibung. Z. Math. Phys. 56, 1–37.',
  },
  schlichting2017: {
    citation:
      'Schlichting, H. & Gersten, K. (2017). Boundary-Layer Theory, 9th ed. Springer (flat-plate skin friction: laminar Blasius, turbulent power law and Schlichting’s log formula).',
    doi: '10.1007/978-3-662-52919-5',
  },
  white2006: {
    citation:
      'White, F. M. (2006). Viscous Fluid Flow, 3rd ed. McGraw-Hill, New York (§3-3: laminar channel, pipe and rectangular-duct flow; turbulent flat-plate correlations).',
  },
  spalding1961: {
    citation: 'Spalding, D. B. (1961). A single formula for the "law of the wall". J. Appl. Mech. 28(3), 455–458.',
    doi: '10.1115/1.3641728',
  },
  shahLondon1978: {
    citation: 'Shah, R. K. & London, A. L. (1978). Laminar Flow Forced Convection in Ducts. Advances in Heat Transfer, Supplement 1. Academic Press, New York.',
    doi: '10.1016/C2013-0-06152-X',
  },

  // --- Wetting -----------------------------------------------------------------------------------
  bico2002: {
    citation: 'Bico, J., Thiele, U. & Quéré, D. (2002). Wetting of textured surfaces. Colloids Surf. A 206, 41–46.',
  },
  smith2013: {
    citation:
      'Smith, J. D., Dhiman, R., Anand, S., Reza-Garduno, E., Cohen, R. E., McKinley, G. H. & Varanasi, K. K. (2013). Droplet mobility on lubricant-impregnated surfaces. Soft Matter 9, 1772–1780.',
  },
  fowkes1964: {
    citation: 'Fowkes, F. M. (1964). Attractive forces at interfaces. Ind. Eng. Chem. 56(12), 40–52.',
    doi: '10.1021/ie50660a008',
  },
  tadmor2004: {
    citation: 'Tadmor, R. (2004). Line energy and the relation between advancing, receding, and Young contact angles. Langmuir 20(18), 7659–7664.',
    doi: '10.1021/la049410h',
  },

  // --- Slip and drag -----------------------------------------------------------------------------
  philip1972: {
    citation:
      'Philip, J. R. (1972). Flows satisfying mixed no-slip and no-shear conditions. Z. Angew. Math. Phys. (ZAMP) 23, 353–372 (volume, pages and the DOI from memory: no publisher page, Crossref-derived reference list or bibliography holding them was found by title, DOI or author; no DOI is given for that reason).',
  },
  laugaStone2003: {
    citation: 'Lauga, E. & Stone, H. A. (2003). Effective slip in pressure-driven Stokes flow. J. Fluid Mech. 489, 55–77.',
    doi: '10.1017/S0022112003004695',
  },
  belyaevVinogradova2010: {
    citation:
      'Belyaev, A. V. & Vinogradova, O. I. (2010). Effective slip in pressure-driven flow past super-hydrophobic stripes. J. Fluid Mech. 652, 489–499; arXiv:0912.1430.',
    doi: '10.1017/S0022112010000741',
  },
  asmolovVinogradova2012: {
    citation: 'Asmolov, E. S. & Vinogradova, O. I. (2012). Effective slip boundary condition for arbitrary one-dimensional surfaces. J. Fluid Mech. 706, 108–117.',
    doi: '10.1017/jfm.2012.228',
  },
  schoenecker2014: {
    citation:
      'Schönecker, C., Baier, T. & Hardt, S. (2014). Influence of the enclosed fluid on the flow over a microstructured surface in the Cassie state. J. Fluid Mech. 740, 168–195.',
    doi: '10.1017/jfm.2013.647',
  },
  kamrinBazantStone2010: {
    citation:
      'Kamrin, K., Bazant, M. Z. & Stone, H. A. (2010). Effective slip boundary conditions for arbitrary periodic surfaces: the surface mobility tensor. J. Fluid Mech. 658, 409–437.',
    doi: '10.1017/S0022112010001801',
  },
  fukagata2006: {
    citation:
      'Fukagata, K., Kasagi, N. & Koumoutsakos, P. (2006). A theoretical prediction of friction drag reduction in turbulent flow by superhydrophobic surfaces. Phys. Fluids 18, 051703.',
    doi: '10.1063/1.2205307',
  },
  ibrahim2021: {
    citation:
      'Ibrahim, J. I., Gómez-de-Segura, G., Chung, D. & García-Mayoral, R. (2021). The smooth-wall-like behaviour of turbulence over drag-altering surfaces: a unifying virtual-origin framework. J. Fluid Mech., published online 18 March 2021.',
  },

  // --- Retention ---------------------------------------------------------------------------------
  wexler2015: {
    citation: 'Wexler, J. S., Jacobi, I. & Stone, H. A. (2015). Shear-driven failure of liquid-infused surfaces. Phys. Rev. Lett. 114, 168301.',
  },
  colosqui2016: {
    citation:
      'Colosqui, C. E., Wexler, J. S., Liu, Y. & Stone, H. A. (2016). Crossover from shear-driven to thermally activated drainage of liquid-infused microscale capillaries. Phys. Rev. Fluids 1, 064101.',
  },
  oliver1977: {
    citation:
      'Oliver, J. F., Huh, C. & Mason, S. G. (1977). Resistance to spreading of liquids by sharp edges. J. Colloid Interface Sci. 59, 568–581 (volume, pages and the DOI from memory: searched by title, DOI and author without a readable record; no DOI is given for that reason).',
  },
  furmidge1962: {
    citation:
      'Furmidge, C. G. L. (1962). Studies at phase interfaces. I. The sliding of liquid drops on solid surfaces and a theory for spray retention. J. Colloid Sci. 17, 309–324.',
    doi: '10.1016/0095-8522(62)90011-9',
  },
  elsherbini2006: {
    citation:
      'ElSherbini, A. I. & Jacobi, A. M. (2006). Retention forces and contact angles for critical liquid drops on non-horizontal surfaces. J. Colloid Interface Sci. 299, 841–849.',
    doi: '10.1016/j.jcis.2006.02.018',
  },
  leveque1928: {
    citation: 'Lévêque, M. A. (1928). Les lois de la transmission de chaleur par convection. Ann. Mines 13, 201–299.',
  },
  shawHanratty1977: {
    citation:
      'Shaw, D. A. & Hanratty, T. J. (1977). Turbulent mass transfer rates to a wall for large Schmidt numbers. AIChE J. 23, 28–37 (volume, pages and the correlation constants 0.0889 and −0.704 used in physics/retention/dissolution.ts from memory: the paper, a record of it and a page quoting the correlation were searched for by title, DOI and constants without result).',
  },
  wilkeChang1955: {
    citation: 'Wilke, C. R. & Chang, P. (1955). Correlation of diffusion coefficients in dilute solutions. AIChE J. 1, 264–270.',
    doi: '10.1002/aic.690010222',
  },

  // --- Interface waves ---------------------------------------------------------------------------
  chandrasekhar1961: {
    citation:
      'Chandrasekhar, S. (1961). Hydrodynamic and Hydromagnetic Stability, ch. X (Rayleigh–Taylor instability) and ch. XI (Kelvin–Helmholtz instability). Oxford: Clarendon Press.',
  },
  lamb1932: {
    citation: 'Lamb, H. (1932). Hydrodynamics, 6th ed., §§267–268 (capillary waves; waves under wind). Cambridge University Press.',
  },
  drazinReid1981: {
    citation: 'Drazin, P. G. & Reid, W. H. (1981). Hydrodynamic Stability, ch. 1 (Kelvin–Helmholtz instability). Cambridge University Press; DOI of the 2nd ed. (2004).',
    doi: '10.1017/CBO9780511616938',
  },
  miles1957: {
    citation: 'Miles, J. W. (1957). On the generation of surface waves by shear flows. J. Fluid Mech. 3(2), 185–204.',
  },
  farabeeCasarella1991: {
    citation:
      'Farabee, T. M. & Casarella, M. J. (1991). Spectral features of wall pressure fluctuations beneath turbulent boundary layers. Phys. Fluids A 3(10), 2410–2420 (volume, pages and the rms band 2.5–3.4 τ_w used in physics/waves/criteria.ts from memory: searched by title, DOI, the rms relation and wall-pressure abstracts; the abstracts read say only that the inner-scaled wall-pressure variance grows logarithmically with the friction Reynolds number).',
  },

  // --- Surfactant --------------------------------------------------------------------------------
  landel2020: {
    citation:
      'Landel, J. R., Peaudecerf, F. J., Temprano-Coleto, F., Gibou, F., Goldstein, R. E. & Luzzatto-Fegiz, P. (2020). A theory for the slip and drag of superhydrophobic surfaces with surfactant. J. Fluid Mech. (2020); arXiv:1904.01194.',
  },
  peaudecerf2017: {
    citation:
      'Peaudecerf, F. J., Landel, J. R., Goldstein, R. E. & Luzzatto-Fegiz, P. (2017). Traces of surfactants can severely limit the drag reduction of superhydrophobic surfaces. Proc. Natl Acad. Sci. USA 114, 7254–7259.',
    doi: '10.1073/pnas.1702469114',
  },
  scharfetter1969: {
    citation:
      'Scharfetter, D. L. & Gummel, H. K. (1969). Large-signal analysis of a silicon Read diode oscillator. IEEE Trans. Electron Devices 16, 64–77.',
    doi: '10.1109/T-ED.1969.16566',
  },

  // --- Heat transfer -----------------------------------------------------------------------------
  mikic1974: {
    citation: 'Mikić, B. B. (1974). Thermal contact conductance; theoretical considerations. Int. J. Heat Mass Transfer 17, 205–214.',
    doi: '10.1016/0017-9310(74)90082-9',
  },
  gnielinski1976: {
    citation: 'Gnielinski, V. (1976). New equations for heat and mass transfer in turbulent pipe and channel flow. Int. Chem. Eng. 16(2), 359–368.',
  },
  petukhov1970: {
    citation: 'Petukhov, B. S. (1970). Heat transfer and friction in turbulent pipe flow with variable physical properties. Advances in Heat Transfer 6, 503–564.',
    doi: '10.1016/S0065-2717(08)70153-9',
  },
  dittusBoelter1930: {
    citation:
      'Dittus, F. W. & Boelter, L. M. K. (1930). Heat transfer in automobile radiators of the tubular type. Univ. Calif. Publ. Eng. 2, 443–461; reprinted Int. Commun. Heat Mass Transfer 12 (1985) 3–22.',
    doi: '10.1016/0735-1933(85)90003-X',
  },
  kader1981: {
    citation: 'Kader, B. A. (1981). Temperature and concentration profiles in fully turbulent boundary layers. Int. J. Heat Mass Transfer 24(9), 1541–1544.',
  },
  wiener1912: {
    citation:
      'Wiener, O. (1912). Die Theorie des Mischkörpers für das Feld der stationären Strömung. Abh. Math.-Phys. Kl. Sächs. Akad. Wiss. Leipzig 32, 509–604 (series, volume and pages as listed in the reference list, ref. 18, of Brundrett, D. L., Glytsis, E. N. & Gaylord, T. K. (1994), Appl. Opt. 33(13), 2695–2706, which was read; the bounds themselves are the series and parallel conductances, derived where they are used).',
  },
  // --- Numerical methods behind committed reference tables ------------------------------------
  babuskaSuri1990: {
    citation: 'Babuška, I. & Suri, M. (1990). The p- and h-p versions of the finite element method, an overview. Comput. Methods Appl. Mech. Eng. 80, 5–26.',
  },
  hecht2012: {
    citation: 'Hecht, F. (2012). New development in FreeFem++. J. Numer. Math. 20(3–4), 251–265.',
    doi: '10.1515/jnum-2012-0013',
  },
  taylorHood1973: {
    citation: 'Taylor, C. & Hood, P. (1973). A numerical solution of the Navier–Stokes equations using the finite element technique. Comput. Fluids 1(1), 73–100.',
    doi: '10.1016/0045-7930(73)90027-3',
  },
  schoeneckerHardt2013: {
    citation:
      'Schönecker, C. & Hardt, S. (2013). Longitudinal and transverse flow over a cavity containing a second immiscible fluid. J. Fluid Mech. (published online 1 February 2013); arXiv:1206.5967.',
  },

  richardson1911: {
    citation:
      'Richardson, L. F. (1911). The approximate arithmetical solution by finite differences of physical problems involving differential equations, with an application to the stresses in a masonry dam. Phil. Trans. R. Soc. Lond. A 210, 307–357.',
    doi: '10.1098/rsta.1911.0009',
  },
  patankar1980: {
    citation: 'Patankar, S. V. (1980). Numerical Heat Transfer and Fluid Flow. Hemisphere, Washington, ch. 4.',
  },
});

export type ReferenceKey = keyof typeof REFERENCES;
