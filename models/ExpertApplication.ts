import 'server-only';
import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from 'sequelize';
import type { User } from './User';

export const APPLICATION_STATUSES = ['pending', 'approved', 'declined'] as const;
export type ApplicationStatus = (typeof APPLICATION_STATUSES)[number];

/** A member's request for expert standing, and the moderator's decision on it. */
export class ExpertApplication extends Model<
  InferAttributes<ExpertApplication>,
  InferCreationAttributes<ExpertApplication>
> {
  declare id: CreationOptional<number>;
  declare userId: number;
  declare pumpsBuilt: number;
  declare years: number;
  declare region: string;
  declare experience: string;
  declare links: string[];
  declare status: CreationOptional<ApplicationStatus>;
  declare decidedBy: number | null;
  declare decisionNote: string | null;
  declare decidedAt: Date | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  declare applicant?: NonAttribute<User>;

  static initModel(sequelize: Sequelize) {
    ExpertApplication.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        userId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        pumpsBuilt: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        years: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        region: { type: DataTypes.STRING(80), allowNull: false },
        experience: { type: DataTypes.TEXT, allowNull: false },
        links: { type: DataTypes.JSON, allowNull: false },
        status: { type: DataTypes.ENUM(...APPLICATION_STATUSES), allowNull: false, defaultValue: 'pending' },
        decidedBy: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        decisionNote: { type: DataTypes.TEXT, allowNull: true },
        decidedAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      {
        sequelize,
        modelName: 'ExpertApplication' /* the bundler minifies class names */,
        tableName: 'expert_applications',
      },
    );
  }
}
