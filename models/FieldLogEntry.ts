import 'server-only';
import {
  DataTypes,
  Model,
  type CreationOptional,
  type ForeignKey,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from 'sequelize';
import { PUMP_TYPES, type PumpType } from '@/lib/vocabulary';
import type { User } from './User';
import type { FieldLogTrial } from './FieldLogTrial';

/** One measured test of an installation; SI columns for queries, `typed` as the member entered it. */
export class FieldLogEntry extends Model<InferAttributes<FieldLogEntry>, InferCreationAttributes<FieldLogEntry>> {
  declare id: CreationOptional<number>;
  declare authorId: number;
  /** the site it is about (sites.ts), set by its association */
  declare siteId?: ForeignKey<number> | null;
  declare siteName: string;
  declare testedOn: string;
  declare pumpType: PumpType;
  declare pumpSize: string;
  declare pumpCount: number;
  declare arrangement: 'single' | 'parallel' | 'staged';
  declare fallM: number;
  declare liftM: number;
  declare driveLengthM: number;
  declare driveSize: string;
  declare driveMaterial: string;
  declare deliveryLengthM: number | null;
  declare deliverySize: string | null;
  declare deliveryMaterial: string | null;
  declare driveFlowM3s: number;
  declare driveFlowMethod: 'measured' | 'estimated';
  declare driveFlowHow: string;
  declare deliveredFlowM3s: number;
  declare beatsPerMinute: number | null;
  declare wasteValveSetting: string;
  declare waterTempC: number | null;
  declare notes: string;
  declare typed: Record<string, string>;
  declare hiddenAt: CreationOptional<Date | null>;
  declare hiddenReason: CreationOptional<string | null>;
  declare deletedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  declare author?: NonAttribute<User>;
  declare trials?: NonAttribute<FieldLogTrial[]>;

  static initModel(sequelize: Sequelize) {
    const si = (allowNull = false) => ({ type: DataTypes.DOUBLE, allowNull });
    FieldLogEntry.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        authorId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        siteName: { type: DataTypes.STRING(80), allowNull: false },
        testedOn: { type: DataTypes.DATEONLY, allowNull: false },
        pumpType: { type: DataTypes.ENUM(...PUMP_TYPES), allowNull: false },
        pumpSize: { type: DataTypes.STRING(8), allowNull: false },
        pumpCount: { type: DataTypes.TINYINT.UNSIGNED, allowNull: false },
        arrangement: { type: DataTypes.ENUM('single', 'parallel', 'staged'), allowNull: false },
        fallM: si(),
        liftM: si(),
        driveLengthM: si(),
        driveSize: { type: DataTypes.STRING(8), allowNull: false },
        driveMaterial: { type: DataTypes.STRING(20), allowNull: false },
        deliveryLengthM: si(true),
        deliverySize: { type: DataTypes.STRING(8), allowNull: true },
        deliveryMaterial: { type: DataTypes.STRING(20), allowNull: true },
        driveFlowM3s: si(),
        driveFlowMethod: { type: DataTypes.ENUM('measured', 'estimated'), allowNull: false },
        driveFlowHow: { type: DataTypes.STRING(300), allowNull: false, defaultValue: '' },
        deliveredFlowM3s: si(),
        beatsPerMinute: si(true),
        wasteValveSetting: { type: DataTypes.STRING(200), allowNull: false, defaultValue: '' },
        waterTempC: si(true),
        notes: { type: DataTypes.TEXT, allowNull: false },
        typed: { type: DataTypes.JSON, allowNull: false },
        hiddenAt: { type: DataTypes.DATE, allowNull: true },
        hiddenReason: { type: DataTypes.STRING(1000), allowNull: true },
        deletedAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      {
        sequelize,
        modelName: 'FieldLogEntry' /* the bundler minifies class names */,
        tableName: 'field_log_entries',
        underscored: true,
      },
    );
  }
}
