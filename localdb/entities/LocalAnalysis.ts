import { Column, Entity, PrimaryColumn } from 'typeorm';

/** One past analysis kept on the device. `body` is the StoredAnalysis JSON (mixture, settings, results). */
@Entity('analysis')
export class LocalAnalysis {
  @PrimaryColumn({ type: 'varchar', length: 40 })
  id: string;

  @Column({ type: 'varchar', length: 200 })
  name: string;

  @Column({ type: 'varchar', length: 40 })
  createdAt: string;

  @Column({ type: 'varchar', length: 10 })
  nucleus: string;

  @Column({ type: 'integer', default: 0 })
  demo: number;

  /** Short "top candidates" line for the history list, so the list never parses bodies. */
  @Column({ type: 'text' })
  summary: string;

  @Column({ type: 'text' })
  body: string;
}
