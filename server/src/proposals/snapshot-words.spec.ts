import { DEPOSIT_CAP_PRESETS, type ProposalSnapshot } from '@layerbook/contracts';
import { formatMoney } from '@layerbook/domain';
import { snapshotForReader } from './snapshot-words';

const CALIFORNIA = DEPOSIT_CAP_PRESETS.find((p) => p.id === 'caHomeImprovement')!;
// Only the fields the reader's words touch; the rest of a snapshot is passed through untouched.
const snapshot = (depositRule: string, depositRuleId?: 'caHomeImprovement' | 'none') =>
  ({ title: 'Hall', depositRule, options: [], ...(depositRuleId ? { depositRuleId } : {}) }) as unknown as ProposalSnapshot;

describe('a proposal as its reader reads it', () => {
  const es = { language: 'es', locale: 'es-US' } as const;

  it('names a ready-made deposit rule in the client’s language, and leaves the stored snapshot as it was', () => {
    const stored = snapshot(CALIFORNIA.name, 'caHomeImprovement');
    const read = snapshotForReader(es, stored);
    // the invoice's own words for the same rule (server/src/billing/invoice-words.spec.ts), amount formatted for es-US
    expect(read.depositRule).toBe(
      `Contratos de mejoras para el hogar en California (Bus. & Prof. Code §7159): lo que sea menor entre ${formatMoney('1000.00', 'USD', 'es-US')} y el 10 % del contrato`,
    );
    expect(stored.depositRule).toBe(CALIFORNIA.name);
    expect(snapshotForReader(es, snapshot('No deposit limit', 'none')).depositRule).not.toBe('No deposit limit');
  });

  it('keeps English, a rule the firm named and an older snapshot without the id as stored', () => {
    expect(snapshotForReader({ language: 'en', locale: 'en-US' }, snapshot(CALIFORNIA.name, 'caHomeImprovement')).depositRule).toBe(
      CALIFORNIA.name,
    );
    expect(snapshotForReader(es, snapshot('Our own rule: 20 % at most')).depositRule).toBe('Our own rule: 20 % at most');
    expect(snapshotForReader(es, snapshot(CALIFORNIA.name)).depositRule).toBe(CALIFORNIA.name);
  });

  it('says the payment labels and the job’s milestone the system wrote in the client’s language; a layer keeps the firm’s name', () => {
    const option = {
      id: 'A',
      payments: [
        { id: 'deposit', label: 'Deposit on acceptance', role: 'deposit', trigger: { kind: 'acceptance' } },
        {
          id: 'progress',
          label: 'Progress payment when Primer is finished on every surface',
          role: 'milestone',
          trigger: { kind: 'layerComplete', layerId: 'l-1' },
        },
        { id: 'final', label: 'Final payment on completion, after the walkthrough', role: 'final', trigger: { kind: 'walkthrough' } },
        { id: 'typed', label: 'Balance when the scaffold comes down', role: 'milestone', trigger: { kind: 'walkthrough' } },
      ],
      schedule: {
        milestones: [
          { id: 'l-1', label: 'Primer' },
          { id: 'job', label: 'Job complete' },
        ],
      },
    };
    const stored = { title: 'Hall', options: [option] } as unknown as ProposalSnapshot;
    const read = snapshotForReader(es, stored).options[0];
    expect(read.payments.map((p) => p.label)).toEqual([
      'Anticipo al aceptar la propuesta',
      'Pago de avance cuando la capa Primer esté terminada en todas las superficies',
      'Pago final al terminar la obra, después del recorrido final',
      'Balance when the scaffold comes down',
    ]);
    expect(read.schedule.milestones.map((m) => m.label)).toEqual(['Primer', 'Obra terminada']);
    expect(stored.options[0].payments[0].label).toBe('Deposit on acceptance');
  });
});
