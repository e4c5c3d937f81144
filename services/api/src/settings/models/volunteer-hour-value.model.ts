import { Column, DataType, Model, Table } from 'sequelize-typescript';

/** The estimated value of one volunteer hour for a data year, with the publication it comes from. */
@Table({ tableName: 'volunteer_hour_values', underscored: true })
export class VolunteerHourValue extends Model {
  declare id: number;

  @Column({ type: DataType.SMALLINT.UNSIGNED, allowNull: false })
  declare dataYear: number;

  /** DECIMAL(8,2): the driver returns it as text, so read it through Number(). */
  @Column({ type: DataType.DECIMAL(8, 2), allowNull: false })
  declare hourlyValue: string | number;

  @Column({ type: DataType.CHAR(3), allowNull: false, defaultValue: 'USD' })
  declare currency: string;

  @Column({ type: DataType.STRING(255), allowNull: false })
  declare source: string;
}
