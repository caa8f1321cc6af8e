/**
 * What a project says about its liquid: one from the library, or a user's property table.
 * Physics reads it; the document (model/types.ts) re-exports it.
 */

/** Liquid chosen for the project: one from the library, or defined by the user. */
export type LiquidChoice =
  | { kind: 'library'; id: string }
  | {
      kind: 'user';
      name: string;
      /** Property table against temperature, interpolated linearly; one row means constant values. */
      table: UserLiquidRow[];
      /** Critical pressure, Pa abs, for the control-valve FF factor; optional. */
      criticalPressure?: number;
    };

/** One row of a user-defined liquid's property table. */
export interface UserLiquidRow {
  /** Temperature, K. */
  temperature: number;
  /** Density, kg/m³. */
  density: number;
  /** Dynamic viscosity, Pa·s. */
  viscosity: number;
  /** Vapour pressure, Pa abs. */
  vapourPressure: number;
}
