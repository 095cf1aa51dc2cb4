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
import { MODERATED_TYPES, type ModeratedType } from '@/lib/vocabulary';

/** An author's request that the moderators look again at a decision on their post; open until one acts on it. */
export class Appeal extends Model<InferAttributes<Appeal>, InferCreationAttributes<Appeal>> {
  declare id: CreationOptional<number>;
  declare userId: number;
  declare postType: ModeratedType;
  declare postId: number;
  declare text: string;
  declare status: CreationOptional<'open' | 'decided'>;
  declare resolvedBy: CreationOptional<number | null>;
  declare resolvedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;

  declare user?: NonAttribute<User>;

  static initModel(sequelize: Sequelize) {
    Appeal.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        userId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        postType: { type: DataTypes.ENUM(...MODERATED_TYPES), allowNull: false },
        postId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        text: { type: DataTypes.STRING(1000), allowNull: false },
        status: { type: DataTypes.ENUM('open', 'decided'), allowNull: false, defaultValue: 'open' },
        resolvedBy: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        resolvedAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
      },
      { sequelize, modelName: 'Appeal', tableName: 'appeals', updatedAt: false },
    );
  }
}
