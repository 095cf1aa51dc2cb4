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
import type { User } from './User';

/** Saved calculator inputs and results, with the engine version that produced them. */
export class WorkedCalculation extends Model<
  InferAttributes<WorkedCalculation>,
  InferCreationAttributes<WorkedCalculation>
> {
  declare id: CreationOptional<number>;
  declare publicId: string;
  declare tool: string;
  declare inputs: Record<string, unknown>;
  declare results: Record<string, unknown>;
  declare engineVersion: string;
  declare title: string | null;
  declare authorId: ForeignKey<User['id']> | null;
  /** the site it is about (sites.ts), set by its association */
  declare siteId?: ForeignKey<number> | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  declare author?: NonAttribute<User>;

  static initModel(sequelize: Sequelize) {
    WorkedCalculation.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        publicId: { type: DataTypes.STRING(16), allowNull: false, unique: true },
        tool: { type: DataTypes.STRING(40), allowNull: false },
        inputs: { type: DataTypes.JSON, allowNull: false },
        results: { type: DataTypes.JSON, allowNull: false },
        engineVersion: { type: DataTypes.STRING(20), allowNull: false },
        title: { type: DataTypes.STRING(160), allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      {
        sequelize,
        modelName: 'WorkedCalculation' /* the bundler minifies class names */,
        tableName: 'worked_calculations',
      },
    );
  }
}
