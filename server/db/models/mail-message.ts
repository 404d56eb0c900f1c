import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** A message captured by the development SMTP fake (the admin's Outbox). */
export class MailMessage extends Model<InferAttributes<MailMessage>, InferCreationAttributes<MailMessage>> {
  declare id: CreationOptional<number>;
  declare toAddress: string;
  declare fromAddress: string;
  declare subject: string;
  declare body: string;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    MailMessage.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        toAddress: { type: DataTypes.TEXT, allowNull: false },
        fromAddress: { type: DataTypes.TEXT, allowNull: false },
        subject: { type: DataTypes.TEXT, allowNull: false },
        body: { type: DataTypes.TEXT, allowNull: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'mail_messages' },
    );
  }
}
