import { DataTypes, literal } from 'sequelize';

/** created_at / updated_at with database defaults, so seeds and raw inserts need not set them. */
export function timestampColumns() {
  return {
    created_at: {
      type: DataTypes.DATE,
      allowNull: false,
      defaultValue: literal('CURRENT_TIMESTAMP'),
    },
    updated_at: {
      type: DataTypes.DATE,
      allowNull: false,
      defaultValue: literal('CURRENT_TIMESTAMP'),
    },
  };
}
