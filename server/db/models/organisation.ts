import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** A shop: its name, address, logo and the defaults of its work (migration 0008). */
export class Organisation extends Model<InferAttributes<Organisation>, InferCreationAttributes<Organisation>> {
  declare id: CreationOptional<number>;
  declare name: string;
  declare address: CreationOptional<string>;
  /** the logo's key in the file store, or null */
  declare logoKey: CreationOptional<string | null>;
  declare defaultLabourRate: CreationOptional<number>;
  declare defaultMarkupPercent: CreationOptional<number>;
  declare drawingNumberScheme: CreationOptional<string>;
  declare allowSelfSignOff: CreationOptional<boolean>;
  declare version: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    Organisation.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        name: { type: DataTypes.STRING(200), allowNull: false },
        address: { type: DataTypes.STRING(500), allowNull: false, defaultValue: '' },
        logoKey: { type: DataTypes.STRING(200), allowNull: true },
        defaultLabourRate: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 85 },
        defaultMarkupPercent: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 15 },
        drawingNumberScheme: { type: DataTypes.STRING(80), allowNull: false, defaultValue: '{job}-{panel}-{sheet:2}' },
        allowSelfSignOff: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'organisations' },
    );
  }
}
