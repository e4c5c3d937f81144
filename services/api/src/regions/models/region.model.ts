import { Column, DataType, HasMany, Model, Table } from 'sequelize-typescript';
import { Chapter } from '../../chapters/models/chapter.model';
import type { Relation } from '../../common/models/relation';

@Table({ tableName: 'regions', underscored: true })
export class Region extends Model {
  declare id: number;

  @Column({ type: DataType.STRING(80), allowNull: false })
  declare name: string;

  @Column({ type: DataType.STRING(8), allowNull: false })
  declare code: string;

  @HasMany(() => Chapter)
  declare chapters?: Relation<Chapter>[];
}
