import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

import type { SubstrateClass } from '@tracewright/shared';

import { notes, optionalNumber, recordAttributes, requiredNumber } from './record-attributes';

export class SubstrateModel extends Model<InferAttributes<SubstrateModel>, InferCreationAttributes<SubstrateModel>> {
  declare id: CreationOptional<number>;
  declare name: string;
  declare manufacturer: string;
  declare substrateClass: SubstrateClass;
  declare thicknessUm: number;
  declare surfaceEnergyDispersiveMilliNPerM: number | null;
  declare surfaceEnergyPolarMilliNPerM: number | null;
  declare waterContactAngleDeg: number | null;
  declare diiodomethaneContactAngleDeg: number | null;
  declare maxContinuousTempC: number;
  declare maxShortExposureTempC: number;
  declare maxShortExposureSeconds: number;
  declare maxStrainPercent: number | null;
  declare isTransferCarrier: boolean;
  declare notes: string;
  declare version: CreationOptional<number>;
  declare archived: CreationOptional<boolean>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    SubstrateModel.init(
      {
        ...recordAttributes(),
        name: { type: DataTypes.STRING(120), allowNull: false },
        manufacturer: { type: DataTypes.STRING(120), allowNull: false, defaultValue: '' },
        substrateClass: { type: DataTypes.STRING(40), allowNull: false },
        thicknessUm: requiredNumber(),
        surfaceEnergyDispersiveMilliNPerM: optionalNumber(),
        surfaceEnergyPolarMilliNPerM: optionalNumber(),
        waterContactAngleDeg: optionalNumber(),
        diiodomethaneContactAngleDeg: optionalNumber(),
        maxContinuousTempC: requiredNumber(),
        maxShortExposureTempC: requiredNumber(),
        maxShortExposureSeconds: requiredNumber(),
        maxStrainPercent: optionalNumber(),
        isTransferCarrier: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        notes: notes(),
      },
      { sequelize, tableName: 'substrates' },
    );
  }
}
