import 'server-only';
import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

/** One bucket-and-stopwatch trial of a field log entry. */
export class FieldLogTrial extends Model<InferAttributes<FieldLogTrial>, InferCreationAttributes<FieldLogTrial>> {
  declare id: CreationOptional<number>;
  declare entryId: number;
  declare position: number;
  declare volumeL: number;
  declare seconds: number;

  static initModel(sequelize: Sequelize) {
    FieldLogTrial.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        entryId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        position: { type: DataTypes.TINYINT.UNSIGNED, allowNull: false },
        volumeL: { type: DataTypes.DOUBLE, allowNull: false },
        seconds: { type: DataTypes.DOUBLE, allowNull: false },
      },
      { sequelize, modelName: 'FieldLogTrial', tableName: 'field_log_trials', underscored: true, timestamps: false },
    );
  }
}
