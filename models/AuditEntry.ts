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

/** One moderation action, role change or expert decision: who, when, what and why. Never changed. */
export class AuditEntry extends Model<InferAttributes<AuditEntry>, InferCreationAttributes<AuditEntry>> {
  declare id: CreationOptional<number>;
  declare actorId: number | null;
  declare action: string;
  declare targetType: string;
  declare targetId: string;
  declare reason: string;
  declare details: Record<string, unknown> | null;
  declare createdAt: CreationOptional<Date>;

  declare actor?: NonAttribute<User>;

  static initModel(sequelize: Sequelize) {
    AuditEntry.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        actorId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        action: { type: DataTypes.STRING(40), allowNull: false },
        targetType: { type: DataTypes.STRING(20), allowNull: false },
        targetId: { type: DataTypes.STRING(40), allowNull: false },
        reason: { type: DataTypes.STRING(1000), allowNull: false },
        details: { type: DataTypes.JSON, allowNull: true },
        createdAt: DataTypes.DATE,
      },
      {
        sequelize,
        modelName: 'AuditEntry' /* the bundler minifies class names */,
        tableName: 'audit_log',
        updatedAt: false,
      },
    );
  }
}
