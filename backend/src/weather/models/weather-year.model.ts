import { Column, DataType, Model, Table } from 'sequelize-typescript';

/** Hours as stored: three parallel arrays, null where the service had no value. */
export interface StoredWeatherHours {
  temperatureC: (number | null)[];
  dewPointC: (number | null)[];
  globalHorizontalWPerM2: (number | null)[];
}

/**
 * One calendar year (UTC) of hourly weather from the weather-history service, cached per grid
 * point (coordinates rounded to 0.1°) and per source, so a second request costs nothing and
 * invented stand-in hours never pass for the real service's.
 */
@Table({ tableName: 'weather_years' })
export class WeatherYear extends Model {
  /** 'stand-in' for the local stand-in, else the service's base URL */
  @Column({ type: DataType.STRING, allowNull: false }) declare sourceKey: string;
  @Column({ type: DataType.DOUBLE, allowNull: false }) declare gridLatitudeDeg: number;
  @Column({ type: DataType.DOUBLE, allowNull: false }) declare gridLongitudeDeg: number;
  @Column({ type: DataType.INTEGER, allowNull: false }) declare year: number;
  @Column({ type: DataType.DOUBLE, allowNull: false }) declare elevationM: number;
  @Column({ type: DataType.DATE, allowNull: false }) declare startAt: Date;
  @Column({ type: DataType.INTEGER, allowNull: false }) declare hourCount: number;
  @Column({ type: DataType.INTEGER, allowNull: false }) declare missingHourCount: number;
  @Column({ type: DataType.JSON, allowNull: false }) declare hours: StoredWeatherHours;
}
