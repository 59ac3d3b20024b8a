import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from 'sequelize';
import { sequelize } from '../config/database';

/** A brewhouse: volumes, efficiency and losses, as shared/brewing's EquipmentProfile (SI units). */
export class EquipmentProfile extends Model<
  InferAttributes<EquipmentProfile>,
  InferCreationAttributes<EquipmentProfile>
> {
  declare id: CreationOptional<number>;
  declare breweryId: number;
  declare name: string;
  declare batchVolumeL: number;
  declare brewhouseEfficiency: number;
  declare boilOffLPerHour: number;
  declare boilMinutes: number;
  declare mashTunDeadSpaceL: number;
  declare kettleDeadSpaceL: number;
  declare trubChillerLossL: number;
  declare fermenterLossL: number;
  declare grainAbsorptionLPerKg: number;
  declare maxMashTunVolumeL: number;
  declare maxKettleVolumeL: number;
  declare mashThicknessLPerKg: number;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

// A fresh object per attribute: Sequelize writes into the one it is given.
const number = () => ({ type: DataTypes.DOUBLE, allowNull: false });

EquipmentProfile.init(
  {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    breweryId: { type: DataTypes.INTEGER, allowNull: false },
    name: { type: DataTypes.STRING(80), allowNull: false },
    batchVolumeL: { ...number(), field: 'batch_volume_l' },
    brewhouseEfficiency: number(),
    boilOffLPerHour: { ...number(), field: 'boil_off_l_per_hour' },
    boilMinutes: number(),
    mashTunDeadSpaceL: { ...number(), field: 'mash_tun_dead_space_l' },
    kettleDeadSpaceL: { ...number(), field: 'kettle_dead_space_l' },
    trubChillerLossL: { ...number(), field: 'trub_chiller_loss_l' },
    fermenterLossL: { ...number(), field: 'fermenter_loss_l' },
    grainAbsorptionLPerKg: { ...number(), field: 'grain_absorption_l_per_kg' },
    maxMashTunVolumeL: { ...number(), field: 'max_mash_tun_volume_l' },
    maxKettleVolumeL: { ...number(), field: 'max_kettle_volume_l' },
    mashThicknessLPerKg: { ...number(), field: 'mash_thickness_l_per_kg' },
    createdAt: DataTypes.DATE,
    updatedAt: DataTypes.DATE,
  },
  { sequelize, tableName: 'equipment_profiles' },
);
