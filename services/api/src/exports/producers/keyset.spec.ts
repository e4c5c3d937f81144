import { literal, Op, where } from 'sequelize';
import { after } from './keyset';

describe('after (keyset paging)', () => {
  it('continues past the last row in each key, ties broken by the keys after it', () => {
    expect(
      after([
        { column: 'month', direction: 'DESC', value: '2026-03-01' },
        { column: 'id', direction: 'ASC', value: 7 },
      ]),
    ).toEqual({
      // A plain bound on the first key first, so the database can read an index range.
      [Op.and]: [
        { month: { [Op.lte]: '2026-03-01' } },
        {
          [Op.or]: [
            { [Op.and]: [{ month: { [Op.lt]: '2026-03-01' } }] },
            { [Op.and]: [{ month: { [Op.eq]: '2026-03-01' } }, { id: { [Op.gt]: 7 } }] },
          ],
        },
      ],
    });
  });

  it('puts NULLs first ascending and last descending, as MariaDB sorts them', () => {
    const at = literal('(SELECT 1)');
    const ascFromNull = after([
      { column: at, direction: 'ASC', value: null, nullable: true },
      { column: 'id', direction: 'ASC', value: 3 },
    ]) as { [Op.or]: unknown[] };
    // After a NULL going up: any value, or a later id among the NULLs.
    expect(ascFromNull[Op.or]).toEqual([
      { [Op.and]: [where(at, { [Op.not]: null })] },
      { [Op.and]: [where(at, { [Op.is]: null }), { id: { [Op.gt]: 3 } }] },
    ]);
    const descFromNull = after([
      { column: at, direction: 'DESC', value: null, nullable: true },
      { column: 'id', direction: 'DESC', value: 3 },
    ]) as { [Op.or]: unknown[] };
    // After a NULL going down only NULLs remain: just the smaller ids among them.
    expect(descFromNull[Op.or]).toEqual([
      { [Op.and]: [where(at, { [Op.is]: null }), { id: { [Op.lt]: 3 } }] },
    ]);
    const descFromValue = after([
      { column: 'submittedAt', direction: 'DESC', value: 'x', nullable: true },
    ]) as { [Op.or]: Array<{ [Op.and]: unknown[] }> };
    expect(descFromValue[Op.or][0][Op.and][0]).toEqual({
      [Op.or]: [{ submittedAt: { [Op.lt]: 'x' } }, { submittedAt: { [Op.is]: null } }],
    });
  });
});
