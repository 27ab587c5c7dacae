import { Column, Entity, PrimaryColumn } from 'typeorm';

/** Small key/value store on the device: session, sync cursor, preferences. */
@Entity('setting')
export class LocalSetting {
  @PrimaryColumn({ type: 'varchar', length: 80 })
  key: string;

  @Column({ type: 'text' })
  value: string;
}
