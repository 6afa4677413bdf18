import { DataTypes } from 'sequelize';

// Functions, not shared objects: Model.init writes `field` into each attribute definition it is
// given, so one object reused across columns would map them all to the first column's name.

/** Columns every material and equipment table has (see migrations 0004 and 0005). */
export const recordAttributes = () => ({
  id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
  version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
  archived: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
  createdAt: DataTypes.DATE(3),
  updatedAt: DataTypes.DATE(3),
});

// DOUBLE, not DECIMAL: the connector hands DOUBLE back as a number, DECIMAL as a string.
export const requiredNumber = () => ({ type: DataTypes.DOUBLE, allowNull: false });
export const optionalNumber = () => ({ type: DataTypes.DOUBLE, allowNull: true });
export const notes = () => ({ type: DataTypes.TEXT, allowNull: false, defaultValue: '' });

/** The tablet's own clock beside ours, and whether the write was made offline (tablet records). */
export const deviceColumns = () => ({
  deviceTime: { type: DataTypes.DATE(3), allowNull: true },
  madeOffline: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
});
