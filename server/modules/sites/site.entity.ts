import { Column, Entity } from 'typeorm';
import type { FeatureCollection, Point, Polygon } from 'geojson';
import { EditableRecord } from '../../db/base-columns';
import type { SiteKind } from '../../../shared/schemas/sites';

/** A place bees are sent: a grower's orchard block or seed field, or a honey location. */
@Entity('sites')
export class Site extends EditableRecord {
  @Column({ type: 'uuid', nullable: true }) growerId: string | null;
  @Column({ type: 'text' }) name: string;
  @Column({ type: 'text' }) kind: SiteKind;
  @Column({ type: 'text' }) crop: string;
  @Column({ type: 'jsonb', nullable: true }) boundary: Polygon | null;
  @Column({ type: 'double precision' }) latitude: number;
  @Column({ type: 'double precision' }) longitude: number;
  @Column({ type: 'double precision', nullable: true }) areaHa: number | null;
  @Column({ type: 'date', nullable: true }) bloomStartOn: string | null;
  @Column({ type: 'date', nullable: true }) bloomEndOn: string | null;
  @Column({ type: 'text' }) accessNotes: string;
  @Column({ type: 'text' }) notes: string;
  @Column({ type: 'jsonb', nullable: true }) drops: FeatureCollection<Point> | null;
}
