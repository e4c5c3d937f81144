import { BelongsTo, Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import type { Relation } from '../../common/models/relation';
import { User } from '../../users/models/user.model';

/** One drawn sample (table `audit_samples`): the plan, the seed and who drew it. */
@Table({ tableName: 'audit_samples', underscored: true, timestamps: false })
export class AuditSample extends Model {
  declare id: number;

  /** The SamplePopulation; JSON comes back parsed or as text, depending on the driver. */
  @Column({ type: DataType.JSON, allowNull: false })
  declare population: unknown;

  /** The SamplePlanView as drawn. */
  @Column({ type: DataType.JSON, allowNull: false })
  declare plan: unknown;

  @Column({ type: DataType.STRING(100), allowNull: false })
  declare seed: string;

  @Column({ type: DataType.STRING(200), allowNull: false })
  declare prng: string;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  declare populationSize: number;

  @ForeignKey(() => User)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  declare drawnBy: number;

  @BelongsTo(() => User, 'drawnBy')
  declare drawer?: Relation<User>;

  @Column({ type: DataType.DATE(3), allowNull: false })
  declare drawnAt: Date;
}
