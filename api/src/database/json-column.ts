import { Column, DataType } from 'sequelize-typescript';
import type { Model } from 'sequelize-typescript';

/**
 * A JSON column. Sequelize's sqlite dialect serialises DataType.JSON on write but hands back the
 * stored TEXT on read, so the getter parses it: models always expose the value, never the string.
 */
export function JsonColumn(options: { allowNull?: boolean } = {}): PropertyDecorator {
  return (target: object, propertyKey: string | symbol) => {
    const key = String(propertyKey);
    Column({
      type: DataType.JSON,
      allowNull: options.allowNull ?? false,
      get(this: Model) {
        const raw: unknown = this.getDataValue(key);
        return typeof raw === 'string' ? JSON.parse(raw) : raw;
      },
    })(target, propertyKey);
  };
}
