import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize';
import type { Boundary, GridSpec } from '../../shared/geo';
import type { CoverStateRow } from './cover-state';
import type { User } from './user';

export class StudyArea extends Model<InferAttributes<StudyArea>, InferCreationAttributes<StudyArea>> {
  declare id: CreationOptional<number>;
  declare teamId: number;
  declare name: string;
  declare description: CreationOptional<string>;
  declare sourceName: string;
  declare sourceFormat: string;
  declare sourceSha256: string;
  declare sourceBytes: Buffer;
  declare sourceSize: number;
  declare boundary: Boundary;
  declare boundaryAreaM2: number;
  declare cellSizeM: number;
  declare minFraction: number;
  declare gridSpec: GridSpec;
  declare patchCount: number;
  /** Int32Array bytes: the grid cell index (row · cols + col) of each patch. */
  declare patchCells: Buffer;
  /** Float32Array bytes: the clipped area of each patch in m². */
  declare patchAreas: Buffer;
  declare totalAreaM2: number;
  declare createdBy: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare states?: NonAttribute<CoverStateRow[]>;
  declare creator?: NonAttribute<User | null>;
}

export function initStudyArea(sequelize: Sequelize): void {
  StudyArea.init(
    {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      teamId: { type: DataTypes.INTEGER, allowNull: false },
      name: { type: DataTypes.TEXT, allowNull: false },
      description: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
      sourceName: { type: DataTypes.TEXT, allowNull: false },
      sourceFormat: { type: DataTypes.TEXT, allowNull: false },
      sourceSha256: { type: DataTypes.TEXT, allowNull: false },
      sourceBytes: { type: DataTypes.BLOB, allowNull: false },
      sourceSize: { type: DataTypes.INTEGER, allowNull: false },
      boundary: { type: DataTypes.JSONB, allowNull: false },
      boundaryAreaM2: { type: DataTypes.DOUBLE, allowNull: false },
      cellSizeM: { type: DataTypes.DOUBLE, allowNull: false },
      minFraction: { type: DataTypes.DOUBLE, allowNull: false },
      gridSpec: { type: DataTypes.JSONB, allowNull: false },
      patchCount: { type: DataTypes.INTEGER, allowNull: false },
      patchCells: { type: DataTypes.BLOB, allowNull: false },
      patchAreas: { type: DataTypes.BLOB, allowNull: false },
      totalAreaM2: { type: DataTypes.DOUBLE, allowNull: false },
      createdBy: { type: DataTypes.INTEGER, allowNull: true },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    {
      sequelize,
      tableName: 'study_areas',
      underscored: true,
      // The large binary columns are read only where needed.
      defaultScope: { attributes: { exclude: ['sourceBytes', 'patchCells', 'patchAreas'] } },
      scopes: { withGrid: { attributes: { exclude: ['sourceBytes'] } }, withSource: {} },
    },
  );
}
