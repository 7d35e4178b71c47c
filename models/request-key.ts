import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

// A create request's Idempotency-Key, per person and kind of record, with the record it made.
export class RequestKey extends Model<InferAttributes<RequestKey>, InferCreationAttributes<RequestKey>> {
  declare id: CreationOptional<number>;
  declare userId: number;
  declare scope: string;
  declare idemKey: string;
  declare fingerprint: string;
  declare recordId: number;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    RequestKey.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        userId: { type: DataTypes.INTEGER, allowNull: false },
        scope: { type: DataTypes.STRING(40), allowNull: false },
        idemKey: { type: DataTypes.STRING(100), allowNull: false },
        fingerprint: { type: DataTypes.CHAR(64), allowNull: false },
        recordId: { type: DataTypes.INTEGER, allowNull: false },
        createdAt: { type: DataTypes.DATE, allowNull: false },
      },
      {
        sequelize,
        modelName: 'RequestKey',
        tableName: 'request_keys',
        updatedAt: false,
        indexes: [{ unique: true, name: 'request_keys_once', fields: ['user_id', 'scope', 'idem_key'] }, { fields: ['created_at'] }],
      },
    );
  }
}
