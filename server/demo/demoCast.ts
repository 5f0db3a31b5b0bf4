// The demo scenario's agency, district, bridges, firms and people. All of them are invented; none
// is a real agency, place, firm or person. The first person of each role signs in as
// `<role>@demo.spanrelay.test`, the others as `first.last@demo.spanrelay.test`.
import type { projects } from '../../db/schema';
import type { Role } from '../../shared/roles';

export const demoPassword = 'spanrelay-demo';
export const demoEmail = (role: Role) => `${role}@demo.spanrelay.test`;

export const demoAgency = 'Marrowfield State Highway Department';
export const demoDistrict = 'Tallis District';

export type DemoProjectKey = 'pellamCreek' | 'harrowRoad' | 'millRun';

// A project row as the seed writes it, plus what the drawings and the README say of the structure.
type DemoProjectFacts = Required<Omit<typeof projects.$inferInsert, 'id' | 'deskDueDays' | 'nextRequestSeq' | 'createdAt'>> & {
  structure: string;
  spansFt: number[];
};

export const demoProjects: Record<DemoProjectKey, DemoProjectFacts> = {
  pellamCreek: {
    code: 'PC-0114',
    name: 'Pellam Creek Bridge, SR 9',
    structureNumber: '27-0114',
    featureCarried: 'State Route 9',
    featureCrossed: 'Pellam Creek',
    county: 'Tallis County',
    contractNumber: 'C-27-2026-08',
    contractorFirm: 'Corbel & Fane Constructors',
    section: 'Tallis Section',
    federalAid: false,
    structure: 'Three-span continuous steel plate girders, 140-175-140 ft, cast-in-place deck; fixed at abutment 1, finger joint at abutment 2',
    spansFt: [140, 175, 140],
  },
  harrowRoad: {
    code: 'HR-0231',
    name: 'Harrowmere Road Overpass over SR 9',
    structureNumber: '27-0231',
    featureCarried: 'County Road 12 (Harrowmere Road)',
    featureCrossed: 'State Route 9',
    county: 'Tallis County',
    contractNumber: 'C-27-2026-15',
    contractorFirm: 'Lattimer-Oake Bridge Co.',
    section: 'Tallis Section',
    federalAid: true,
    structure: 'Two-span prestressed concrete girders, 2 × 110 ft, made continuous for live load at the pier; compression seals at both abutments',
    spansFt: [110, 110],
  },
  millRun: {
    code: 'MR-0409',
    name: 'Millbrack Run Bridge, County Road 40',
    structureNumber: '27-0409',
    featureCarried: 'County Road 40',
    featureCrossed: 'Millbrack Run',
    county: 'Tallis County',
    contractNumber: 'C-27-2026-21',
    contractorFirm: 'Grennock Heavy Civil',
    section: 'Brackwater Section',
    federalAid: false,
    structure: 'Single-span cast-in-place concrete slab, 36 ft; strip seals at both abutments',
    spansFt: [36],
  },
};

// The primary demo project: the one the walkthrough and the end-to-end tests start from.
export const demoProject = demoProjects.pellamCreek;

export type DemoPersonKey =
  | 'dana'
  | 'wes'
  | 'rosa'
  | 'priya'
  | 'owen'
  | 'marcus'
  | 'ruth'
  | 'ines'
  | 'tomas'
  | 'nell'
  | 'june'
  | 'sam';

export type DemoPerson = { role: Role; name: string; organization: string; email: string; projects: DemoProjectKey[] };

const agencyUnit = (unit: string) => `${demoAgency}, ${unit}`;
const allProjects: DemoProjectKey[] = ['pellamCreek', 'harrowRoad', 'millRun'];

export const demoPeople: Record<DemoPersonKey, DemoPerson> = {
  dana: { role: 'contractor', name: 'Dana Ostrow', organization: 'Corbel & Fane Constructors', email: demoEmail('contractor'), projects: ['pellamCreek'] },
  wes: { role: 'contractor', name: 'Wes Dunmore', organization: 'Lattimer-Oake Bridge Co.', email: 'wes.dunmore@demo.spanrelay.test', projects: ['harrowRoad'] },
  rosa: { role: 'contractor', name: 'Rosa Tennant', organization: 'Grennock Heavy Civil', email: 'rosa.tennant@demo.spanrelay.test', projects: ['millRun'] },
  priya: { role: 'section_engineer', name: 'Priya Halden', organization: agencyUnit('Tallis Section'), email: demoEmail('section_engineer'), projects: ['pellamCreek', 'harrowRoad'] },
  owen: { role: 'section_engineer', name: 'Owen Brask', organization: agencyUnit('Brackwater Section'), email: 'owen.brask@demo.spanrelay.test', projects: ['millRun'] },
  marcus: { role: 'central_office', name: 'Marcus Trell', organization: agencyUnit('Bridge Office'), email: demoEmail('central_office'), projects: allProjects },
  ruth: {
    role: 'engineer_of_record',
    name: 'Ruth Caldera, P.E.',
    organization: 'Hollisford Span Engineers',
    email: demoEmail('engineer_of_record'),
    projects: ['pellamCreek', 'millRun'],
  },
  ines: {
    role: 'engineer_of_record',
    name: 'Ines Marwood, P.E.',
    organization: agencyUnit('Bridge Design Unit'),
    email: 'ines.marwood@demo.spanrelay.test',
    projects: ['harrowRoad', 'millRun'],
  },
  tomas: { role: 'field_inspector', name: 'Tomas Reyl', organization: agencyUnit('Tallis Section'), email: demoEmail('field_inspector'), projects: ['pellamCreek', 'harrowRoad'] },
  nell: { role: 'field_inspector', name: 'Nell Varga', organization: agencyUnit('Brackwater Section'), email: 'nell.varga@demo.spanrelay.test', projects: ['millRun'] },
  june: { role: 'auditor', name: 'June Akers', organization: agencyUnit('Internal Review'), email: demoEmail('auditor'), projects: ['pellamCreek'] },
  sam: { role: 'admin', name: 'Sam Pellow', organization: demoAgency, email: demoEmail('admin'), projects: ['pellamCreek'] },
};
