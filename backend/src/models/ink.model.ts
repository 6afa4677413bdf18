import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

import type { Ink, Solvent } from '@tracewright/shared';

import { notes, optionalNumber, recordAttributes, requiredNumber } from './record-attributes';

export class InkModel extends Model<InferAttributes<InkModel>, InferCreationAttributes<InkModel>> {
  declare id: CreationOptional<number>;
  declare name: string;
  declare manufacturer: string;
  declare function: Ink['function'];
  declare viscosityMilliPaS: number;
  declare surfaceTensionMilliNPerM: number;
  declare surfaceTensionDispersiveMilliNPerM: number | null;
  declare surfaceTensionPolarMilliNPerM: number | null;
  declare densityKgPerM3: number;
  declare solidsWtPercent: number;
  declare solidsDensityKgPerM3: number | null;
  declare sheetResistanceOhmPerSq: number | null;
  declare tcrPerK: number | null;
  declare cureReferenceTempC: number | null;
  declare cureReferenceMinutes: number | null;
  declare activationEnergyKJPerMol: number | null;
  declare minEffectiveCureTempC: number | null;
  declare potLifeHours: number | null;
  declare storageNotes: string;
  declare solvents: Solvent[];
  declare notes: string;
  declare version: CreationOptional<number>;
  declare archived: CreationOptional<boolean>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    InkModel.init(
      {
        ...recordAttributes(),
        name: { type: DataTypes.STRING(120), allowNull: false },
        manufacturer: { type: DataTypes.STRING(120), allowNull: false, defaultValue: '' },
        function: { type: DataTypes.ENUM('conductor', 'dielectric', 'graphic'), allowNull: false },
        viscosityMilliPaS: requiredNumber(),
        surfaceTensionMilliNPerM: requiredNumber(),
        surfaceTensionDispersiveMilliNPerM: optionalNumber(),
        surfaceTensionPolarMilliNPerM: optionalNumber(),
        densityKgPerM3: requiredNumber(),
        solidsWtPercent: requiredNumber(),
        solidsDensityKgPerM3: optionalNumber(),
        sheetResistanceOhmPerSq: optionalNumber(),
        tcrPerK: optionalNumber(),
        cureReferenceTempC: optionalNumber(),
        cureReferenceMinutes: optionalNumber(),
        // The default underscoring would spell it activation_energy_k_j_per_mol.
        activationEnergyKJPerMol: { ...optionalNumber(), field: 'activation_energy_kj_per_mol' },
        minEffectiveCureTempC: optionalNumber(),
        potLifeHours: optionalNumber(),
        storageNotes: { type: DataTypes.STRING(1000), allowNull: false, defaultValue: '' },
        solvents: { type: DataTypes.JSON, allowNull: false },
        notes: notes(),
      },
      { sequelize, tableName: 'inks' },
    );
  }
}
