import 'server-only';
import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

/** A record a member's device sent once, with the answer it got, so a repeat gets the same answer. */
export class IdempotencyKey extends Model<InferAttributes<IdempotencyKey>, InferCreationAttributes<IdempotencyKey>> {
  declare id: CreationOptional<number>;
  declare userId: number;
  declare scope: string;
  declare idemKey: string;
  declare fingerprint: string;
  declare status: number;
  declare response: unknown;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    IdempotencyKey.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        userId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        scope: { type: DataTypes.STRING(40), allowNull: false },
        idemKey: { type: DataTypes.STRING(64), allowNull: false },
        fingerprint: { type: DataTypes.CHAR(64), allowNull: false },
        status: { type: DataTypes.SMALLINT.UNSIGNED, allowNull: false },
        response: { type: DataTypes.JSON, allowNull: false },
        createdAt: DataTypes.DATE,
      },
      {
        sequelize,
        modelName: 'IdempotencyKey' /* the bundler minifies class names */,
        tableName: 'idempotency_keys',
        updatedAt: false,
      },
    );
  }
}
