import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

export const MAIL_STATUSES = ['queued', 'sent', 'failed'] as const;
export type MailStatus = (typeof MAIL_STATUSES)[number];

// The outbox log: what the app tried to send, and how it went.
export class MailMessage extends Model<InferAttributes<MailMessage>, InferCreationAttributes<MailMessage>> {
  declare id: CreationOptional<number>;
  declare kind: string;
  declare toAddress: string;
  declare subject: string;
  declare bodyText: string;
  declare status: MailStatus;
  declare error: string | null;
  declare sentAt: Date | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    MailMessage.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        kind: { type: DataTypes.STRING(40), allowNull: false },
        toAddress: { type: DataTypes.STRING(1000), allowNull: false },
        subject: { type: DataTypes.STRING(300), allowNull: false },
        bodyText: { type: DataTypes.TEXT, allowNull: false },
        status: { type: DataTypes.ENUM(...MAIL_STATUSES), allowNull: false },
        error: { type: DataTypes.STRING(500), allowNull: true },
        sentAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: { type: DataTypes.DATE, allowNull: false },
        updatedAt: { type: DataTypes.DATE, allowNull: false },
      },
      { sequelize, modelName: 'MailMessage', tableName: 'mail_messages' },
    );
  }
}
