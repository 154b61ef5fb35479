/**
 * The kernel's table layouts: the column of every number in the side, block, section and inflow tables, the codes
 * stored in them (surface types, wall models), and the layout of the per-cell and per-wall-bin sums.
 *
 * The kernel reads numbers from typed arrays rather than objects (hot paths, and tables that cross threads and files
 * as they are), so these constants are the tables' schema. They live here, apart from the code that builds or reads
 * the tables, so that every builder (sideTable.ts, inflowTable.ts, createState.ts) and every reader (the kernel,
 * results/, io/) depends on this leaf module and on nothing of each other's. Constants only: no imports, no logic.
 */

/** Rows of the domain's sides, in this order; block faces follow from row DOMAIN_SIDES, four per block. */
export const SIDE_LEFT = 0;
export const SIDE_RIGHT = 1;
export const SIDE_BOTTOM = 2;
export const SIDE_TOP = 3;
export const DOMAIN_SIDES = 4;

/** Surface types (SIDE_TYPE). */
export const BOUNDARY_PERIODIC = 0;
export const BOUNDARY_SPECULAR = 1; // symmetry planes and specular walls
export const BOUNDARY_WALL = 2;
/** Open to a vessel: molecules leave freely and enter with the reservoir's Maxwellian influx (kernel/inflow.ts). */
export const BOUNDARY_RESERVOIR = 3;
/** The axis of an axisymmetric domain: never reached by a 3D flight, so nothing happens there. */
export const BOUNDARY_AXIS = 4;
/** The end of a long duct held at a pressure by characteristic relations (kernel/pressureOutlet.ts). */
export const BOUNDARY_PRESSURE_OUTLET = 5;

/** Gas–surface interaction models of walls (SIDE_MODEL). */
export const WALL_DIFFUSE = 0;
export const WALL_SPECULAR = 1;
export const WALL_MAXWELL = 2;
export const WALL_CERCIGNANI_LAMPIS = 3;

/** Side table columns: one row of SIDE_STRIDE numbers per surface (kernel/sideTable.ts). */
export const SIDE_TYPE = 0;
export const SIDE_MODEL = 1;
export const SIDE_TEMPERATURE = 2;
export const SIDE_UX = 3;
export const SIDE_UY = 4;
export const SIDE_UZ = 5;
/** Maxwell: accommodation; Cercignani–Lampis: normal energy accommodation α_n. */
export const SIDE_ACCOMMODATION = 6;
/** Cercignani–Lampis tangential energy accommodation α_t = σ_t(2 − σ_t). */
export const SIDE_TANGENTIAL_ENERGY_ACCOMMODATION = 7;
export const SIDE_BIN_OFFSET = 8;
export const SIDE_BIN_COUNT = 9;
/** Thermal speed sqrt(kT_w/m) of the wall (m/s). */
export const SIDE_THERMAL_SPEED = 10;
/** 1 when the surface is normal to x (a line x = SIDE_PLANE), 0 when normal to y. */
export const SIDE_NORMAL_IS_X = 11;
/** +1 or −1: direction along the normal axis pointing into the gas. */
export const SIDE_INWARD = 12;
/** Position of the surface's line (m) and its extent along the surface (m). */
export const SIDE_PLANE = 13;
export const SIDE_FROM = 14;
export const SIDE_TO = 15;
/** Reservoirs: number density (1/m³); temperature and drift are in SIDE_TEMPERATURE and SIDE_UX…. */
export const SIDE_NUMBER_DENSITY = 16;
/** Pressure outlets: the pressure held (Pa). */
export const SIDE_PRESSURE = 17;
export const SIDE_STRIDE = 18;

/** Block table columns (one row per block): the solid rectangle [x0, x1] × [y0, y1], m. */
export const BLOCK_X0 = 0;
export const BLOCK_X1 = 1;
export const BLOCK_Y0 = 2;
export const BLOCK_Y1 = 3;
export const BLOCK_STRIDE = 4;

/** Flow-section table columns: the line x = SECTION_X from SECTION_Y0 to SECTION_Y1, m. */
export const SECTION_X = 0;
export const SECTION_Y0 = 1;
export const SECTION_Y1 = 2;
export const SECTION_STRIDE = 3;

/** Inflow table columns, one row per segment of a reservoir side or pressure outlet (kernel/inflowTable.ts). */
export const INFLOW_SURFACE = 0;
export const INFLOW_FROM = 1;
export const INFLOW_TO = 2;
/** Mean number of simulated particles entering per time step. */
export const INFLOW_PER_STEP = 3;
/** s = u_n / v_mp of the reservoir's drift along the inward normal. */
export const INFLOW_SPEED_RATIO = 4;
/** Particle weight of the cells next to the segment. */
export const INFLOW_WEIGHT = 5;
/** The state molecules enter from: temperature (K), drift velocity (m/s). */
export const INFLOW_TEMPERATURE = 6;
export const INFLOW_DRIFT_X = 7;
export const INFLOW_DRIFT_Y = 8;
export const INFLOW_DRIFT_Z = 9;
/** The cell next to the segment (pressure outlets sample it). */
export const INFLOW_CELL = 10;
/** Gas volume of that cell (m³) and the segment's area (m²). */
export const INFLOW_CELL_VOLUME = 11;
export const INFLOW_AREA = 12;
export const INFLOW_STRIDE = 13;

/** Per wall bin: incident count, momentum given to the wall (x, y, z), energy given to the wall in its own frame. */
export const WALL_HITS = 0;
export const WALL_PX = 1;
export const WALL_PY = 2;
export const WALL_PZ = 3;
export const WALL_ENERGY = 4;
export const SUMS_PER_WALL_BIN = 5;

/**
 * Per cell: the raw moment sums of the sampled particles (kernel/sampleCells.ts adds them; results/cellFields.ts
 * derives every field from them).
 */
export const SUM_N = 0;
export const SUM_VX = 1;
export const SUM_VY = 2;
export const SUM_VZ = 3;
export const SUM_VXX = 4;
export const SUM_VYY = 5;
export const SUM_VZZ = 6;
export const SUM_VXY = 7;
export const SUM_VXZ = 8;
export const SUM_VYZ = 9;
/** Σ |v|² v_x and Σ |v|² v_y: translational energy flux moments. */
export const SUM_V2VX = 10;
export const SUM_V2VY = 11;
export const SUM_EROT = 12;
export const SUM_EROT_VX = 13;
export const SUM_EROT_VY = 14;
export const RAW_CELL_SUMS = 15;
