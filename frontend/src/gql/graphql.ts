/* eslint-disable */
import type { DocumentTypeDecoration } from '@graphql-typed-document-node/core';
export type Maybe<T> = T | null;
export type InputMaybe<T> = Maybe<T>;
export type Exact<T extends { [key: string]: unknown }> = { [K in keyof T]: T[K] };
export type MakeOptional<T, K extends keyof T> = Omit<T, K> & { [SubKey in K]?: Maybe<T[SubKey]> };
export type MakeMaybe<T, K extends keyof T> = Omit<T, K> & { [SubKey in K]: Maybe<T[SubKey]> };
export type MakeEmpty<T extends { [key: string]: unknown }, K extends keyof T> = { [_ in K]?: never };
export type Incremental<T> = T | { [P in keyof T]?: P extends ' $fragmentName' | '__typename' ? T[P] : never };
/** All built-in and custom scalars, mapped to their actual values */
export type Scalars = {
  ID: { input: string; output: string; }
  String: { input: string; output: string; }
  Boolean: { input: boolean; output: boolean; }
  Int: { input: number; output: number; }
  Float: { input: number; output: number; }
  /** An ISO-8601 date-time string (UTC). */
  DateTime: { input: string; output: string; }
  /** Arbitrary JSON (settings snapshots, audit before/after images). */
  JSON: { input: unknown; output: unknown; }
  /** A list of numbers sent as one JSON array: cheap to send for long density grids. */
  NumberList: { input: number[]; output: number[]; }
};

export type AcceptInvitationInput = {
  displayName?: InputMaybe<Scalars['String']['input']>;
  password: Scalars['String']['input'];
  token: Scalars['String']['input'];
};

export type AddTieInput = {
  /** 1 (certain) to 4 (possible). */
  confidence: Scalars['Int']['input'];
  eventAId: Scalars['ID']['input'];
  eventBId: Scalars['ID']['input'];
  evidence?: InputMaybe<Array<Scalars['String']['input']>>;
  hypothesisId: Scalars['ID']['input'];
  note?: InputMaybe<Scalars['String']['input']>;
};

/** A point of a core's age-depth curve: the posterior of the age of the sediment at one depth. */
export type AgeDepthPoint = {
  __typename?: 'AgeDepthPoint';
  /** True depth below the core top, m. */
  depthM: Scalars['Float']['output'];
  /** Event-free depth (m): the depth with every event bed's thickness above it removed. */
  eventFreeDepthM: Scalars['Float']['output'];
  /** Old end of the central 95 % interval (97.5 % quantile), cal BP. */
  high95CalBp: Scalars['Float']['output'];
  /** Young end of the central 95 % interval (2.5 % quantile), cal BP. */
  low95CalBp: Scalars['Float']['output'];
  /** Posterior median age, cal BP. */
  medianCalBp: Scalars['Float']['output'];
};

export type AgeModelDiagnostics = {
  __typename?: 'AgeModelDiagnostics';
  converged: Scalars['Boolean']['output'];
  maxRhat: Scalars['Float']['output'];
  message: Scalars['String']['output'];
  minEss: Scalars['Float']['output'];
};

/** One computation of a site's chronology from its column. */
export type AgeModelRun = {
  __typename?: 'AgeModelRun';
  /** HEMIPELAGIC_RATE runs: the age-depth curve at every contact and every 5 cm of true depth, top down; empty for ORDER_ONLY. */
  ageDepth: Array<AgeDepthPoint>;
  createdAt: Scalars['DateTime']['output'];
  /** The depth model the run used. */
  depthModel: DepthModel;
  diagnostics?: Maybe<AgeModelDiagnostics>;
  events: Array<EventPosterior>;
  finishedAt?: Maybe<Scalars['DateTime']['output']>;
  id: Scalars['ID']['output'];
  message?: Maybe<Scalars['String']['output']>;
  progress: Scalars['Float']['output'];
  /**
   * One shared reservoir offset per Delta-R source of the site's marine samples (samples naming one
   * deltaRSource, or naming none with identical deltaR and deltaRError): drawn once per state of the
   * chain for all its samples. Empty when no marine sample has a Delta-R error.
   */
  reservoirOffsets: Array<ReservoirOffsetPosterior>;
  samples: Array<SamplePosterior>;
  seed: Scalars['Int']['output'];
  settings: Scalars['JSON']['output'];
  site: Site;
  /** True when the site's column or samples changed after this run was queued. */
  stale: Scalars['Boolean']['output'];
  /** What changed in the site's column since this run was queued; empty while it is up to date. */
  staleReasons: Array<StaleReason>;
  status: JobStatus;
  /** True when this is the run its site uses downstream (Site.downstreamRun). */
  usedDownstream: Scalars['Boolean']['output'];
};

/** How a sample's age relates to the deposit it sits in. */
export type AgeRelation =
  /** The sample formed when the deposit formed. */
  | 'DATES_DEPOSIT'
  /** Detrital or inherited material: older than the deposit by an unknown offset. */
  | 'OLDER_THAN_DEPOSIT'
  /** Roots, burrows, intrusions: younger than the deposit by an unknown offset. */
  | 'YOUNGER_THAN_DEPOSIT';

/** A file on a site, unit or sample, kept in object storage. */
export type Attachment = {
  __typename?: 'Attachment';
  contentType: Scalars['String']['output'];
  createdAt: Scalars['DateTime']['output'];
  fileName: Scalars['String']['output'];
  id: Scalars['ID']['output'];
  sizeBytes: Scalars['Int']['output'];
  /** Relative URL of a preview (longest side at most 320 px) of an image once a worker has made it (bearer token required); null before, and for other files. */
  thumbnailUrl?: Maybe<Scalars['String']['output']>;
  /** Relative URL to download (bearer token required). */
  url: Scalars['String']['output'];
};

export type AuditConnection = {
  __typename?: 'AuditConnection';
  edges: Array<AuditEdge>;
  pageInfo: PageInfo;
};

export type AuditEdge = {
  __typename?: 'AuditEdge';
  cursor: Scalars['String']['output'];
  node: AuditRecord;
};

/** Who changed what and when. */
export type AuditRecord = {
  __typename?: 'AuditRecord';
  action: Scalars['String']['output'];
  actor?: Maybe<User>;
  after?: Maybe<Scalars['JSON']['output']>;
  at: Scalars['DateTime']['output'];
  before?: Maybe<Scalars['JSON']['output']>;
  id: Scalars['ID']['output'];
  objectId: Scalars['ID']['output'];
  /** The changed object's name (a site's name, a sample's lab code, ...); null when it has none. */
  objectName?: Maybe<Scalars['String']['output']>;
  objectType: Scalars['String']['output'];
  /** Names of the objects whose ids appear in before/after (the object itself, its site, unit, segment, ...). */
  referencedNames: Array<NamedId>;
};

export type AuditTrailInput = {
  actorId?: InputMaybe<Scalars['ID']['input']>;
  after?: InputMaybe<Scalars['String']['input']>;
  first?: InputMaybe<Scalars['Int']['input']>;
  from?: InputMaybe<Scalars['DateTime']['input']>;
  objectId?: InputMaybe<Scalars['ID']['input']>;
  objectType?: InputMaybe<Scalars['String']['input']>;
  projectId: Scalars['ID']['input'];
  to?: InputMaybe<Scalars['DateTime']['input']>;
};

/** A bearer token for later requests (`Authorization: Bearer <token>`). */
export type AuthPayload = {
  __typename?: 'AuthPayload';
  token: Scalars['String']['output'];
  user: User;
};

export type CalibrateInput = {
  c14Age: Scalars['Float']['input'];
  c14Error: Scalars['Float']['input'];
  curve: CurveCode;
  deltaR?: InputMaybe<Scalars['Float']['input']>;
  deltaRError?: InputMaybe<Scalars['Float']['input']>;
  /** Sample latitude; Marine20 warns above 60 degrees. */
  latitude?: InputMaybe<Scalars['Float']['input']>;
};

export type CalibrateLuminescenceInput = {
  /** Age in years before the measurement year. */
  ageYears: Scalars['Float']['input'];
  errorYears: Scalars['Float']['input'];
  measurementYear: Scalars['Int']['input'];
};

/** A calendar-age density with its summaries. */
export type Calibration = {
  __typename?: 'Calibration';
  curve?: Maybe<CurveCode>;
  /** The 1-year grid where the probability is above 1e-6 of the total (for the widest errors about 55,000 points, 2.9 MB: prefer densityGrid to draw). */
  density: Array<DensityPoint>;
  /** The same span for drawing: 1-year bins, pooled into wider bins of whole years when the span is longer than 2,000 years; each value is its bin's mean probability per year to 4 significant figures, at the bin's middle. */
  densityGrid: DensityGrid;
  hpd68: Array<HpdRange>;
  hpd95: Array<HpdRange>;
  meanCalBp: Scalars['Float']['output'];
  medianCalBp: Scalars['Float']['output'];
  sdYears: Scalars['Float']['output'];
  warnings: Array<Scalars['String']['output']>;
};

export type CalibrationCurveInfo = {
  __typename?: 'CalibrationCurveInfo';
  builtIn: Scalars['Boolean']['output'];
  code: Scalars['String']['output'];
  marine: Scalars['Boolean']['output'];
  name: Scalars['String']['output'];
  oldestCalBp: Scalars['Int']['output'];
  youngestCalBp: Scalars['Int']['output'];
};

export type ChiSquareTest = {
  __typename?: 'ChiSquareTest';
  critical5: Scalars['Float']['output'];
  df: Scalars['Int']['output'];
  passes: Scalars['Boolean']['output'];
  /** Ward & Wilson (1978) statistic. */
  t: Scalars['Float']['output'];
};

export type ChooseDownstreamRunInput = {
  /** A successful run of the site; null or left out: follow the site's newest successful run again. */
  runId?: InputMaybe<Scalars['ID']['input']>;
  siteId: Scalars['ID']['input'];
};

/** A regional event in either analysis's table, matched by its member site events. */
export type ComparedEventRow = {
  __typename?: 'ComparedEventRow';
  /** Null when analysis A's table does not have the event. */
  a?: Maybe<ComparedEventSide>;
  b?: Maybe<ComparedEventSide>;
  difference: EventDifference;
  label: Scalars['String']['output'];
  regionalEventId: Scalars['ID']['output'];
};

/** One side of a compared event row. */
export type ComparedEventSide = {
  __typename?: 'ComparedEventSide';
  counted: Scalars['Boolean']['output'];
  inclusionProbability: Scalars['Float']['output'];
  medianCalBp?: Maybe<Scalars['Float']['output']>;
  reason: Scalars['String']['output'];
  spanShare: Scalars['Float']['output'];
  throughGoing: Scalars['Boolean']['output'];
  untied: Scalars['Boolean']['output'];
};

export type ComparedProbability = {
  __typename?: 'ComparedProbability';
  a: WindowProbability;
  b: WindowProbability;
  medianDifference: Scalars['Float']['output'];
  /** A renewal model's name, or MODEL_AVERAGED. */
  model: Scalars['String']['output'];
  rangesOverlap: Scalars['Boolean']['output'];
  windowYears: Scalars['Float']['output'];
};

export type ComparedStatistic = {
  __typename?: 'ComparedStatistic';
  a: RangeEstimate;
  b: RangeEstimate;
  /** B's median minus A's. */
  medianDifference: Scalars['Float']['output'];
  quantity: Scalars['String']['output'];
  /** Whether the 95 % ranges overlap: a difference inside overlapping ranges is not resolved by the data. */
  rangesOverlap: Scalars['Boolean']['output'];
  unit: Scalars['String']['output'];
};

/** A physical-property log of a core (magnetic susceptibility, density, CT number, ...). */
export type CoreLog = {
  __typename?: 'CoreLog';
  baseDepthM: Scalars['Float']['output'];
  /** Channel names in sheet order. */
  channels: Array<Scalars['String']['output']>;
  createdAt: Scalars['DateTime']['output'];
  id: Scalars['ID']['output'];
  name: Scalars['String']['output'];
  /** Number of depth rows stored. */
  rowCount: Scalars['Int']['output'];
  site: Site;
  /** Depth of the first and last rows (m below the core top). */
  topDepthM: Scalars['Float']['output'];
  /**
   * Channels for drawing, each at most maxPoints (2-2000) block means; all channels unless some
   * are named.
   */
  traces: Array<CoreLogTrace>;
  /** The unit of each channel, in the same order. */
  units: Array<Scalars['String']['output']>;
};


/** A physical-property log of a core (magnetic susceptibility, density, CT number, ...). */
export type CoreLogTracesArgs = {
  channels?: InputMaybe<Array<Scalars['String']['input']>>;
  maxPoints?: Scalars['Int']['input'];
};

/** One channel of a core log thinned for drawing: block means over equal depth bins. */
export type CoreLogTrace = {
  __typename?: 'CoreLogTrace';
  channel: Scalars['String']['output'];
  /** Depths (m below the core top) of the drawn points, increasing. */
  depthsM: Array<Scalars['Float']['output']>;
  unit: Scalars['String']['output'];
  /** Readings at those depths (block means), in the channel's unit. */
  values: Array<Scalars['Float']['output']>;
};

/** The counting rule a table was made with, defaults filled in. */
export type CountingRule = {
  __typename?: 'CountingRule';
  confidenceWeights?: Maybe<Array<Scalars['Float']['output']>>;
  includeUntied: Scalars['Boolean']['output'];
  minimumSpanShare: Scalars['Float']['output'];
  qualityWeights?: Maybe<Array<Scalars['Float']['output']>>;
};

/**
 * Which of a segment's regional events count in its earthquake record. Every field is optional; the
 * default counts every tied regional event recorded at a site of the segment and leaves untied
 * single-site events out.
 */
export type CountingRuleInput = {
  /** Inclusion probability (0-1) for tie confidence 1, 2, 3 and 4 (the event's weakest tie); omitted: no confidence weighting. */
  confidenceWeights?: InputMaybe<Array<Scalars['Float']['input']>>;
  /** Whether untied single-site events count as earthquakes of their own (default false); the span share does not apply to them. */
  includeUntied?: InputMaybe<Scalars['Boolean']['input']>;
  /** 0-1: a tied event counts only when its member sites span at least this share of the segment's along-strike extent (0: every event, partial or through-going). */
  minimumSpanShare?: InputMaybe<Scalars['Float']['input']>;
  /** Inclusion probability (0-1) for horizon quality 1, 2, 3 and 4 (the event's best member on the segment); omitted: no quality weighting. */
  qualityWeights?: InputMaybe<Array<Scalars['Float']['input']>>;
};

export type CreateEventHorizonInput = {
  /** 1-sigma error of displacementM, m (> 0). */
  displacementErrorM?: InputMaybe<Scalars['Float']['input']>;
  /** Coseismic displacement, m (>= 0); null clears it. */
  displacementM?: InputMaybe<Scalars['Float']['input']>;
  evidence?: InputMaybe<Array<Scalars['String']['input']>>;
  name: Scalars['String']['input'];
  notes?: InputMaybe<Scalars['String']['input']>;
  quality: Scalars['Int']['input'];
  siteId: Scalars['ID']['input'];
  /** 1-sigma error of subsidenceM, m (> 0). */
  subsidenceErrorM?: InputMaybe<Scalars['Float']['input']>;
  /** Coseismic subsidence, m; null clears it. */
  subsidenceM?: InputMaybe<Scalars['Float']['input']>;
  unitAboveId: Scalars['ID']['input'];
  unitBelowId: Scalars['ID']['input'];
};

export type CreateHypothesisInput = {
  /** Copy every tie of this hypothesis. */
  copyFromId?: InputMaybe<Scalars['ID']['input']>;
  description?: InputMaybe<Scalars['String']['input']>;
  name: Scalars['String']['input'];
  projectId: Scalars['ID']['input'];
};

export type CreateProjectInput = {
  description?: InputMaybe<Scalars['String']['input']>;
  name: Scalars['String']['input'];
  tectonicSetting?: InputMaybe<TectonicSetting>;
};

export type CreateReleaseInput = {
  note: Scalars['String']['input'];
  projectId: Scalars['ID']['input'];
};

export type CreateSampleInput = {
  ageRelation: AgeRelation;
  c14Age?: InputMaybe<Scalars['Float']['input']>;
  c14Error?: InputMaybe<Scalars['Float']['input']>;
  calendarAgeBp?: InputMaybe<Scalars['Float']['input']>;
  calendarErrorYears?: InputMaybe<Scalars['Float']['input']>;
  curve?: InputMaybe<CurveCode>;
  delta13C?: InputMaybe<Scalars['Float']['input']>;
  deltaR?: InputMaybe<Scalars['Float']['input']>;
  deltaRError?: InputMaybe<Scalars['Float']['input']>;
  /** Name of the regional Delta-R entry (at most 100 characters); empty clears it. */
  deltaRSource?: InputMaybe<Scalars['String']['input']>;
  depthM?: InputMaybe<Scalars['Float']['input']>;
  excluded?: InputMaybe<Scalars['Boolean']['input']>;
  exclusionReason?: InputMaybe<Scalars['String']['input']>;
  /** Scale of the exponential prior on the sample's age offset from its deposit, years (1 to 10,000); null takes the material's default. */
  inheritanceScaleYears?: InputMaybe<Scalars['Float']['input']>;
  labCode: Scalars['String']['input'];
  material: SampleMaterial;
  measurementYear?: InputMaybe<Scalars['Int']['input']>;
  method: DatingMethod;
  notes?: InputMaybe<Scalars['String']['input']>;
  siteId: Scalars['ID']['input'];
  unitId: Scalars['ID']['input'];
};

export type CreateSegmentInput = {
  /** Down-dip width, km (> 0, at most 1,000). */
  downDipWidthKm?: InputMaybe<Scalars['Float']['input']>;
  endKm: Scalars['Float']['input'];
  name: Scalars['String']['input'];
  notes?: InputMaybe<Scalars['String']['input']>;
  projectId: Scalars['ID']['input'];
  startKm: Scalars['Float']['input'];
};

export type CreateSiteInput = {
  alongStrikeKm: Scalars['Float']['input'];
  elevationM?: InputMaybe<Scalars['Float']['input']>;
  kind: SiteKind;
  latitude: Scalars['Float']['input'];
  longitude: Scalars['Float']['input'];
  name: Scalars['String']['input'];
  notes?: InputMaybe<Scalars['String']['input']>;
  projectId: Scalars['ID']['input'];
  segmentId?: InputMaybe<Scalars['ID']['input']>;
  waterDepthM?: InputMaybe<Scalars['Float']['input']>;
};

export type CreateUnitInput = {
  /** Estimated thickness (m) of mud the unit's base eroded; at least 0. */
  basalErosionM?: InputMaybe<Scalars['Float']['input']>;
  baseDepthM: Scalars['Float']['input'];
  facies: Facies;
  /**
   * Insert mid-column: when true and `position` is taken, the unit there and every younger unit
   * move up one position, renumbered in the same transaction as the insert (all or nothing). When
   * false or absent, a taken position is refused. The depths must still fit between the neighbours.
   */
  makeRoom?: InputMaybe<Scalars['Boolean']['input']>;
  name: Scalars['String']['input'];
  notes?: InputMaybe<Scalars['String']['input']>;
  /** 1 is the oldest unit, at the base of the column. */
  position: Scalars['Int']['input'];
  siteId: Scalars['ID']['input'];
  topDepthM: Scalars['Float']['input'];
};

export type CurveBandPoint = {
  __typename?: 'CurveBandPoint';
  c14Age: Scalars['Float']['output'];
  c14Sigma: Scalars['Float']['output'];
  calBp: Scalars['Int']['output'];
};

/** Calibration curve code. SHCAL20 must be installed by an administrator before use. */
export type CurveCode =
  | 'INTCAL20'
  | 'MARINE20'
  | 'SHCAL20';

export type CurvePoint = {
  __typename?: 'CurvePoint';
  value: Scalars['Float']['output'];
  years: Scalars['Float']['output'];
};

/** How a sample was dated. */
export type DatingMethod =
  | 'HISTORICAL'
  | 'LUMINESCENCE'
  | 'RADIOCARBON'
  | 'TEPHRA';

/** A density on a regular calendar grid: value i is the mean probability per year around startCalBp + i * stepYears. */
export type DensityGrid = {
  __typename?: 'DensityGrid';
  startCalBp: Scalars['Float']['output'];
  stepYears: Scalars['Int']['output'];
  values: Scalars['NumberList']['output'];
};

/** One year of a calendar-age density. */
export type DensityPoint = {
  __typename?: 'DensityPoint';
  calBp: Scalars['Int']['output'];
  probability: Scalars['Float']['output'];
};

/** How a run relates the ages of a column to depth. */
export type DepthModel =
  /**
   * For cores of event beds in hemipelagic mud: ages follow event-free depth (the beds' thickness
   * removed, each bed deposited at once) through mud accumulating at rates with a gamma prior and
   * autoregressive memory between neighbouring depth sections (after Blaauw & Christen 2011,
   * Bayesian Analysis 6(3):457-474); mud eroded under a bed lengthens its interval.
   */
  | 'HEMIPELAGIC_RATE'
  /** Stratigraphic order only: events and samples lie in the order of their units, depth says nothing more (trenches, marshes, outcrops). */
  | 'ORDER_ONLY';

/** A researcher's choice of the age model run a site uses downstream, in place of its newest successful run. */
export type DownstreamRunChoice = {
  __typename?: 'DownstreamRunChoice';
  chosenAt: Scalars['DateTime']['output'];
  /** Who chose it (null once their account is gone). */
  chosenBy?: Maybe<User>;
  /** True when the site has a successful run newer than the chosen one. */
  newerRunExists: Scalars['Boolean']['output'];
  /** The site's newest successful run: the chosen one, or a newer one the choice keeps out. */
  newestRun: AgeModelRun;
  /** The chosen run (a successful run of the site). */
  run: AgeModelRun;
  site: Site;
};

/** How an event differs between two analyses' event tables. */
export type EventDifference =
  | 'COUNTED_IN_A_ONLY'
  | 'COUNTED_IN_B_ONLY'
  | 'INCLUSION_CHANGED'
  | 'ONLY_IN_A'
  | 'ONLY_IN_B'
  | 'SAME';

/** The contact at which an earthquake is interpreted: one site's event. */
export type EventHorizon = {
  __typename?: 'EventHorizon';
  /** Thickness of the event bed at a core site: the unit above the horizon (top to base depth), m; null elsewhere or without depths. */
  bedThicknessM?: Maybe<Scalars['Float']['output']>;
  /** 1-sigma error of displacementM, m. */
  displacementErrorM?: Maybe<Scalars['Float']['output']>;
  /** Measured coseismic displacement (slip), m, e.g. in a trench. */
  displacementM?: Maybe<Scalars['Float']['output']>;
  evidence: Array<Scalars['String']['output']>;
  id: Scalars['ID']['output'];
  /** Posterior summary from the site's run used downstream (Site.downstreamRun), if any. */
  latestPosterior?: Maybe<EventPosterior>;
  name: Scalars['String']['output'];
  notes?: Maybe<Scalars['String']['output']>;
  /** 1 (certain) to 4 (possible). */
  quality: Scalars['Int']['output'];
  site: Site;
  /** 1-sigma error of subsidenceM, m. */
  subsidenceErrorM?: Maybe<Scalars['Float']['output']>;
  /** Measured coseismic subsidence, m (negative for uplift), e.g. from a marsh's microfossil transfer function. */
  subsidenceM?: Maybe<Scalars['Float']['output']>;
  /** The first post-event unit. */
  unitAbove: Unit;
  /** The unit holding pre-event deposits. */
  unitBelow: Unit;
  version: Scalars['Int']['output'];
};

export type EventLadder = {
  __typename?: 'EventLadder';
  columns: Array<LadderColumn>;
  project: Project;
};

/** Posterior age of one event horizon. */
export type EventPosterior = {
  __typename?: 'EventPosterior';
  density: Array<DensityPoint>;
  ess?: Maybe<Scalars['Float']['output']>;
  eventHorizon: EventHorizon;
  hpd68: Array<HpdRange>;
  hpd95: Array<HpdRange>;
  meanCalBp: Scalars['Float']['output'];
  medianCalBp: Scalars['Float']['output'];
  rhat?: Maybe<Scalars['Float']['output']>;
};

/** Lithology or facies of a stratigraphic unit. */
export type Facies =
  | 'COLLUVIUM'
  | 'HEMIPELAGIC_MUD'
  | 'OTHER'
  | 'PEAT'
  | 'SAND_SHEET'
  | 'SOIL'
  | 'TEPHRA'
  | 'TIDAL_MUD'
  | 'TURBIDITE';

export type FitRenewalInput = {
  intervalsYears: Array<Scalars['Float']['input']>;
  model: RenewalModel;
  /** Years since the last event (right-censored). */
  openIntervalYears?: InputMaybe<Scalars['Float']['input']>;
};

export type HistogramBin = {
  __typename?: 'HistogramBin';
  count: Scalars['Float']['output'];
  fromYears: Scalars['Float']['output'];
  toYears: Scalars['Float']['output'];
};

/** A highest-density range; olderCalBp >= youngerCalBp. */
export type HpdRange = {
  __typename?: 'HpdRange';
  olderCalBp: Scalars['Float']['output'];
  probability: Scalars['Float']['output'];
  youngerCalBp: Scalars['Float']['output'];
};

/** A named, versioned set of ties. */
export type Hypothesis = {
  __typename?: 'Hypothesis';
  /** Who created it; null when that account was removed or the hypothesis was seeded. */
  author?: Maybe<User>;
  copiedFrom?: Maybe<Hypothesis>;
  createdAt: Scalars['DateTime']['output'];
  description?: Maybe<Scalars['String']['output']>;
  id: Scalars['ID']['output'];
  /** Its joint age model runs, newest first (at most 20). */
  jointRuns: Array<JointAgeModelRun>;
  /** The newest joint age model run of the hypothesis, whatever its status. */
  latestJointRun?: Maybe<JointAgeModelRun>;
  name: Scalars['String']['output'];
  /** Every minimal order loop of the hypothesis, of any length (at most 200 are listed). */
  orderConflicts: Array<OrderConflict>;
  preferred: Scalars['Boolean']['output'];
  project: Project;
  regionalEvents: Array<RegionalEvent>;
  ties: Array<Tie>;
  version: Scalars['Int']['output'];
};

export type ImportColumn = {
  __typename?: 'ImportColumn';
  /** The field the column is read as; null when not recognised or ignored. */
  field?: Maybe<Scalars['String']['output']>;
  header: Scalars['String']['output'];
  source: ImportColumnSource;
};

/** How the import read one header of the sheet. */
export type ImportColumnSource =
  /** Chosen for this sheet (columnChoices). */
  | 'CHOSEN'
  /** The header is one of our field names (ignoring case, spaces and punctuation). */
  | 'NAME'
  /** A choice the project remembers from an earlier committed import. */
  | 'REMEMBERED'
  /** Not recognised: choose a field or ignore the column. */
  | 'UNKNOWN';

export type ImportPreviewRow = {
  __typename?: 'ImportPreviewRow';
  hpd95: Array<HpdRange>;
  labCode: Scalars['String']['output'];
  medianCalBp?: Maybe<Scalars['Float']['output']>;
  row: Scalars['Int']['output'];
  unitName: Scalars['String']['output'];
  warnings: Array<Scalars['String']['output']>;
};

/** Where an import problem lies. */
export type ImportProblemScope =
  /** The header row: field names the column concerned, or is "header" for the list of unrecognised columns. */
  | 'HEADER'
  /** One data row; row 1 is the first data row after the header. */
  | 'ROW'
  /** The sheet as a whole (empty, malformed, too long, or the count of problems not listed); field is "csv". */
  | 'SHEET';

export type ImportResult = {
  __typename?: 'ImportResult';
  /** Every named header of the sheet in order, with the field it is read as. */
  columns: Array<ImportColumn>;
  committed: Scalars['Boolean']['output'];
  errors: Array<ImportRowError>;
  /** Calibrated preview of the valid rows (lab code, median and 95.4 % ranges). */
  preview: Array<ImportPreviewRow>;
  rowCount: Scalars['Int']['output'];
};

/** One problem in a lab sheet: in one row, in the header, or in the sheet as a whole (see scope). */
export type ImportRowError = {
  __typename?: 'ImportRowError';
  field: Scalars['String']['output'];
  message: Scalars['String']['output'];
  /** The data row (from 1); 0 for a HEADER or SHEET problem. */
  row: Scalars['Int']['output'];
  scope: ImportProblemScope;
};

export type ImportSamplesInput = {
  /**
   * The field each named header of this sheet holds, for headers that are not our own field names
   * (e.g. "Conventional age" -> c14Age), or null to ignore the column. These override the project's
   * remembered choices; a committed import remembers them for the project's later sheets.
   */
  columnChoices?: InputMaybe<Array<LabSheetColumnChoiceInput>>;
  /** false: validate only. true: write all rows in one transaction, or none when any row has an error. */
  commit: Scalars['Boolean']['input'];
  /** CSV text with the documented header (see the template). */
  csv: Scalars['String']['input'];
  siteId: Scalars['ID']['input'];
};

export type InstallCurveInput = {
  code: CurveCode;
  marine: Scalars['Boolean']['input'];
  name: Scalars['String']['input'];
  /** The curve file: cal BP, 14C age, sigma, then optional columns. */
  text: Scalars['String']['input'];
};

export type IntervalEstimate = {
  __typename?: 'IntervalEstimate';
  high95: Scalars['Float']['output'];
  /** Inter-event time from event index+1 (older) to event index (younger), years. */
  index: Scalars['Int']['output'];
  low95: Scalars['Float']['output'];
  medianYears: Scalars['Float']['output'];
  /** The older event's name, as youngerEvent. */
  olderEvent?: Maybe<Scalars['String']['output']>;
  /** With inclusion weights: share of draws holding the interval (its younger event kept with an older one before it); null without weights. */
  shareOfDraws?: Maybe<Scalars['Float']['output']>;
  /** The younger event's name (a site's event horizon; a regional event's members as "Site E3 + Core T2"); null when the record varies between draws (weighted counting rule). */
  youngerEvent?: Maybe<Scalars['String']['output']>;
};

export type Invitation = {
  __typename?: 'Invitation';
  acceptedAt?: Maybe<Scalars['DateTime']['output']>;
  email: Scalars['String']['output'];
  expiresAt: Scalars['DateTime']['output'];
  id: Scalars['ID']['output'];
  role: Role;
};

/** An invitation link's state, as its holder may see it. */
export type InvitationLink = {
  __typename?: 'InvitationLink';
  /** The project the link invites to; null for an unknown token. */
  projectName?: Maybe<Scalars['String']['output']>;
  /** Whether the link can still be used. */
  status: InvitationLinkStatus;
};

/** Whether an invitation link can still be used. */
export type InvitationLinkStatus =
  /** Past its expiry; a project admin can send a new one. */
  | 'EXPIRED'
  /** Not used and not expired: the form can be filled in. */
  | 'OPEN'
  /** No invitation has this token (mistyped or cut short). */
  | 'UNKNOWN'
  /** Already used to join the project; the holder signs in instead. */
  | 'USED';

export type InviteMemberInput = {
  email: Scalars['String']['input'];
  projectId: Scalars['ID']['input'];
  role: Role;
};

/** State of a long computation run as a job. */
export type JobStatus =
  | 'CANCELLED'
  | 'FAILED'
  | 'QUEUED'
  | 'RUNNING'
  | 'SUCCEEDED';

/** One chain of a joint age model run. */
export type JointAgeModelChain = {
  __typename?: 'JointAgeModelChain';
  /** 0-based; the chain's random numbers come from the run's seed and this index. */
  index: Scalars['Int']['output'];
  message?: Maybe<Scalars['String']['output']>;
  progress: Scalars['Float']['output'];
  status: JobStatus;
};

/**
 * A joint age model run of a hypothesis: every site with a tied event, every regional event with a
 * member there (an untied event there is a regional event of one). Its status follows its chains:
 * RUNNING once one starts, SUCCEEDED when all have and their draws are summarised, FAILED with the
 * first failed chain's message, CANCELLED with all of them.
 */
export type JointAgeModelRun = {
  __typename?: 'JointAgeModelRun';
  chains: Array<JointAgeModelChain>;
  createdAt: Scalars['DateTime']['output'];
  depthModels: Array<JointSiteDepthModel>;
  /** R-hat and ESS over every regional event, site event and sample. */
  diagnostics?: Maybe<AgeModelDiagnostics>;
  finishedAt?: Maybe<Scalars['DateTime']['output']>;
  hypothesis: Hypothesis;
  /** The hypothesis version it modelled. */
  hypothesisVersion: Scalars['Int']['output'];
  id: Scalars['ID']['output'];
  message?: Maybe<Scalars['String']['output']>;
  /** The mean of its chains' progress (1 once the results are stored). */
  progress: Scalars['Float']['output'];
  /** Every regional event's joint posterior (empty until it succeeds). */
  regionalEvents: Array<JointRegionalEventPosterior>;
  /** Every modelled sample's outlier probability and deposit age. */
  samples: Array<SamplePosterior>;
  seed: Scalars['Int']['output'];
  settings: Scalars['JSON']['output'];
  /** Every event horizon's posterior at the modelled sites. */
  siteEvents: Array<EventPosterior>;
  /** The sites it modelled, along strike. */
  sites: Array<Site>;
  /** True when the hypothesis or a modelled site's column changed after this run was queued. */
  stale: Scalars['Boolean']['output'];
  /** What changed since; empty while it is up to date. */
  staleReasons: Array<StaleReason>;
  status: JobStatus;
};

/** The joint posterior age of one regional event: one age shared by every member. */
export type JointRegionalEventPosterior = {
  __typename?: 'JointRegionalEventPosterior';
  density: Array<DensityPoint>;
  ess: Scalars['Float']['output'];
  hpd68: Array<HpdRange>;
  hpd95: Array<HpdRange>;
  /** As RegionalEvent.id: the sorted member ids. */
  id: Scalars['ID']['output'];
  meanCalBp: Scalars['Float']['output'];
  medianCalBp: Scalars['Float']['output'];
  members: Array<EventHorizon>;
  rhat: Scalars['Float']['output'];
};

/** A joint age model run named as an input (its details are on the joint run itself). */
export type JointRunReference = {
  __typename?: 'JointRunReference';
  id: Scalars['ID']['output'];
};

/** The depth model a joint run gave one site (its latest site run's, or for a core without one the hemipelagic model when its column fits). */
export type JointSiteDepthModel = {
  __typename?: 'JointSiteDepthModel';
  depthModel: DepthModel;
  siteId: Scalars['ID']['output'];
  siteName: Scalars['String']['output'];
};

/** What one header of a lab sheet holds. */
export type LabSheetColumnChoiceInput = {
  /** One of the template's column names (labCode, unit, c14Age, ...), or null: ignore the column. */
  field?: InputMaybe<Scalars['String']['input']>;
  /** The header as written in the sheet (matched ignoring case and repeated spaces); 1 to 200 characters. */
  header: Scalars['String']['input'];
};

export type LadderColumn = {
  __typename?: 'LadderColumn';
  events: Array<LadderEvent>;
  latestAgeModelRun?: Maybe<AgeModelRun>;
  site: Site;
};

export type LadderEvent = {
  __typename?: 'LadderEvent';
  /** The same thinned posterior as points (larger to send; prefer densityGrid). */
  density: Array<DensityPoint>;
  /** The posterior thinned for drawing (at most 64 values); null when the site has no successful run. */
  densityGrid?: Maybe<DensityGrid>;
  eventHorizon: EventHorizon;
  hpd95: Array<HpdRange>;
  medianCalBp?: Maybe<Scalars['Float']['output']>;
};

/** A moment magnitude from an empirical scaling relation, with the relation's sigma and name. */
export type MagnitudeEstimate = {
  __typename?: 'MagnitudeEstimate';
  mw: Scalars['Float']['output'];
  relation: Scalars['String']['output'];
  sigma: Scalars['Float']['output'];
};

/** A user's role in one project. */
export type Membership = {
  __typename?: 'Membership';
  id: Scalars['ID']['output'];
  project: Project;
  role: Role;
  user: User;
};

export type ModelCurves = {
  __typename?: 'ModelCurves';
  density: Array<CurvePoint>;
  hazard: Array<CurvePoint>;
  model: RenewalModel;
  survival: Array<CurvePoint>;
};

/** One renewal model in a recurrence analysis. */
export type ModelResult = {
  __typename?: 'ModelResult';
  /** AIC of the fit to the median event ages. */
  aic: Scalars['Float']['output'];
  /** AICc (Hurvich & Tsai 1989), n = intervals with the open one; null when the record is too short (n <= k + 1). */
  aicc?: Maybe<Scalars['Float']['output']>;
  /** Akaike weight from AICc (from AIC only when no model has an AICc). */
  akaikeWeight: Scalars['Float']['output'];
  /** Maximum-likelihood aperiodicity of the median event ages. */
  aperiodicity: Scalars['Float']['output'];
  /** Aperiodicity over draws, with parameter uncertainty and from dating alone; null in older analyses. */
  aperiodicityRange?: Maybe<ParameterRange>;
  deltaAic: Scalars['Float']['output'];
  /** AICc minus the lowest AICc. */
  deltaAicc?: Maybe<Scalars['Float']['output']>;
  logLikelihood: Scalars['Float']['output'];
  /** Mean recurrence over draws, with parameter uncertainty and from dating alone; null in older analyses. */
  meanRecurrenceRange?: Maybe<ParameterRange>;
  /** Maximum-likelihood mean recurrence of the median event ages, years. */
  meanRecurrenceYears: Scalars['Float']['output'];
  model: RenewalModel;
  /** Share of draws in which this model has the lowest AICc. */
  preferredShare?: Maybe<Scalars['Float']['output']>;
  /** Window probabilities: headline ranges with parameter uncertainty, dating-only ranges beside. */
  probabilities: Array<WindowProbability>;
};

export type Mutation = {
  __typename?: 'Mutation';
  acceptInvitation: AuthPayload;
  addTie: Tie;
  cancelAgeModelRun: AgeModelRun;
  /** Stop a queued or running joint run and all its chains (CORRELATOR, ADMIN). */
  cancelJointAgeModelRun: JointAgeModelRun;
  cancelRecurrenceAnalysis: RecurrenceAnalysis;
  /**
   * Choose which successful age model run of a site the ladder, regional events, site recurrence and
   * the refresh use, or (runId null) follow the newest successful run again (RESEARCHER, ADMIN).
   * BAD_USER_INPUT on runId for a run that is not a successful run of the site. Results computed from
   * the run used before become stale.
   */
  chooseDownstreamRun: Site;
  createEventHorizon: EventHorizon;
  createHypothesis: Hypothesis;
  createProject: Project;
  createRelease: Release;
  createSample: Sample;
  createSegment: Segment;
  createSite: Site;
  createUnit: Unit;
  deleteAttachment: Scalars['Boolean']['output'];
  /** Remove a core log (RESEARCHER, ADMIN). */
  deleteCoreLog: Scalars['Boolean']['output'];
  deleteEventHorizon: Scalars['Boolean']['output'];
  deleteHypothesis: Scalars['Boolean']['output'];
  deleteSample: Scalars['Boolean']['output'];
  deleteSegment: Scalars['Boolean']['output'];
  deleteSite: Scalars['Boolean']['output'];
  deleteUnit: Scalars['Boolean']['output'];
  /** Validate a lab sheet (CSV) for a site; with commit true, write every row in one transaction or none. */
  importSamples: ImportResult;
  /** Install or replace a calibration curve (e.g. SHCal20) from its published five-column file. Installed curves serve every project on the server: operators only (OPERATOR_EMAILS). */
  installCalibrationCurve: CalibrationCurveInfo;
  inviteMember: Invitation;
  /** Queue fresh runs for every stale result the caller's role may start, in dependency order, with the same settings and seeds (RESEARCHER, CORRELATOR, ANALYST, ADMIN). */
  refreshStaleResults: RefreshPlan;
  removeMember: Scalars['Boolean']['output'];
  removeTie: Scalars['Boolean']['output'];
  requestPasswordReset: Scalars['Boolean']['output'];
  resetPassword: Scalars['Boolean']['output'];
  setMemberRole: Membership;
  setPreferredHypothesis: Hypothesis;
  /** Turn the automatic refresh after changes on or off (ADMIN). */
  setRefreshSettings: RefreshSettings;
  /** Sign in with e-mail and password; returns a bearer token. */
  signIn: AuthPayload;
  startAgeModelRun: AgeModelRun;
  /** Queue a joint age model run of a hypothesis (CORRELATOR, ADMIN): one job per chain. */
  startJointAgeModelRun: JointAgeModelRun;
  startRecurrenceAnalysis: RecurrenceAnalysis;
  updateEventHorizon: EventHorizon;
  updateHypothesis: Hypothesis;
  updateSample: Sample;
  updateSegment: Segment;
  updateSite: Site;
  updateUnit: Unit;
  /** Check a core log sheet row by row and store it on its core (RESEARCHER, ADMIN). */
  uploadCoreLog: CoreLog;
};


export type MutationAcceptInvitationArgs = {
  input: AcceptInvitationInput;
};


export type MutationAddTieArgs = {
  input: AddTieInput;
};


export type MutationCancelAgeModelRunArgs = {
  id: Scalars['ID']['input'];
};


export type MutationCancelJointAgeModelRunArgs = {
  id: Scalars['ID']['input'];
};


export type MutationCancelRecurrenceAnalysisArgs = {
  id: Scalars['ID']['input'];
};


export type MutationChooseDownstreamRunArgs = {
  input: ChooseDownstreamRunInput;
};


export type MutationCreateEventHorizonArgs = {
  input: CreateEventHorizonInput;
};


export type MutationCreateHypothesisArgs = {
  input: CreateHypothesisInput;
};


export type MutationCreateProjectArgs = {
  input: CreateProjectInput;
};


export type MutationCreateReleaseArgs = {
  input: CreateReleaseInput;
};


export type MutationCreateSampleArgs = {
  input: CreateSampleInput;
};


export type MutationCreateSegmentArgs = {
  input: CreateSegmentInput;
};


export type MutationCreateSiteArgs = {
  input: CreateSiteInput;
};


export type MutationCreateUnitArgs = {
  input: CreateUnitInput;
};


export type MutationDeleteAttachmentArgs = {
  id: Scalars['ID']['input'];
};


export type MutationDeleteCoreLogArgs = {
  id: Scalars['ID']['input'];
};


export type MutationDeleteEventHorizonArgs = {
  id: Scalars['ID']['input'];
};


export type MutationDeleteHypothesisArgs = {
  id: Scalars['ID']['input'];
};


export type MutationDeleteSampleArgs = {
  id: Scalars['ID']['input'];
};


export type MutationDeleteSegmentArgs = {
  id: Scalars['ID']['input'];
};


export type MutationDeleteSiteArgs = {
  id: Scalars['ID']['input'];
};


export type MutationDeleteUnitArgs = {
  id: Scalars['ID']['input'];
};


export type MutationImportSamplesArgs = {
  input: ImportSamplesInput;
};


export type MutationInstallCalibrationCurveArgs = {
  input: InstallCurveInput;
};


export type MutationInviteMemberArgs = {
  input: InviteMemberInput;
};


export type MutationRefreshStaleResultsArgs = {
  projectId: Scalars['ID']['input'];
};


export type MutationRemoveMemberArgs = {
  projectId: Scalars['ID']['input'];
  userId: Scalars['ID']['input'];
};


export type MutationRemoveTieArgs = {
  id: Scalars['ID']['input'];
};


export type MutationRequestPasswordResetArgs = {
  email: Scalars['String']['input'];
};


export type MutationResetPasswordArgs = {
  input: ResetPasswordInput;
};


export type MutationSetMemberRoleArgs = {
  input: SetMemberRoleInput;
};


export type MutationSetPreferredHypothesisArgs = {
  id: Scalars['ID']['input'];
};


export type MutationSetRefreshSettingsArgs = {
  input: SetRefreshSettingsInput;
};


export type MutationSignInArgs = {
  email: Scalars['String']['input'];
  password: Scalars['String']['input'];
};


export type MutationStartAgeModelRunArgs = {
  input: StartAgeModelRunInput;
};


export type MutationStartJointAgeModelRunArgs = {
  input: StartJointAgeModelRunInput;
};


export type MutationStartRecurrenceAnalysisArgs = {
  input: StartRecurrenceAnalysisInput;
};


export type MutationUpdateEventHorizonArgs = {
  id: Scalars['ID']['input'];
  input: UpdateEventHorizonInput;
  version: Scalars['Int']['input'];
};


export type MutationUpdateHypothesisArgs = {
  id: Scalars['ID']['input'];
  input: UpdateHypothesisInput;
};


export type MutationUpdateSampleArgs = {
  id: Scalars['ID']['input'];
  input: UpdateSampleInput;
  version: Scalars['Int']['input'];
};


export type MutationUpdateSegmentArgs = {
  id: Scalars['ID']['input'];
  input: UpdateSegmentInput;
  version: Scalars['Int']['input'];
};


export type MutationUpdateSiteArgs = {
  id: Scalars['ID']['input'];
  input: UpdateSiteInput;
  version: Scalars['Int']['input'];
};


export type MutationUpdateUnitArgs = {
  id: Scalars['ID']['input'];
  input: UpdateUnitInput;
  version: Scalars['Int']['input'];
};


export type MutationUploadCoreLogArgs = {
  input: UploadCoreLogInput;
};

/** An id in an audit record's before/after images, with the name of what it identifies. */
export type NamedId = {
  __typename?: 'NamedId';
  id: Scalars['ID']['output'];
  name: Scalars['String']['output'];
};

/**
 * A minimal cycle of the hypothesis's order graph (each regional event one node, each site's column
 * ordering its members): ties that cannot all hold, because together they put an event before
 * itself. A pair of crossing ties is a loop of two regional events.
 */
export type OrderConflict = {
  __typename?: 'OrderConflict';
  /** Every site event on the loop, in loop order. */
  events: Array<EventHorizon>;
  /** The loop in plain words, naming the sites, events and ties on it. */
  message: Scalars['String']['output'];
  /** Ids of the regional events on the loop (as RegionalEvent.id), in loop order. */
  regionalEventIds: Array<Scalars['ID']['output']>;
  /** The sites of the loop's steps, along strike. */
  sites: Array<Site>;
  /** The loop's steps in order: each step's younger event is tied to the next step's older one. */
  steps: Array<OrderStep>;
  /** A tie on the loop (the first of the first regional event's chain). */
  tieA: Tie;
  /** Another tie on the loop (the first of the second regional event's chain). */
  tieB: Tie;
  /** Every tie on the loop, in loop order. */
  ties: Array<Tie>;
};

/**
 * One step of an order loop: at one site, the member of one regional event lies below (so is
 * older than) the member of the next regional event on the loop.
 */
export type OrderStep = {
  __typename?: 'OrderStep';
  /** The lower, older event at the site. */
  older: EventHorizon;
  /** The site whose column orders the two events. */
  site: Site;
  /** The higher, younger event at the site. */
  younger: EventHorizon;
};

export type PageInfo = {
  __typename?: 'PageInfo';
  endCursor?: Maybe<Scalars['String']['output']>;
  hasNextPage: Scalars['Boolean']['output'];
};

/** A parameter's range over draws with parameter uncertainty (headline) and from dating alone. */
export type ParameterRange = {
  __typename?: 'ParameterRange';
  datingOnlyHigh95?: Maybe<Scalars['Float']['output']>;
  datingOnlyLow95?: Maybe<Scalars['Float']['output']>;
  high95: Scalars['Float']['output'];
  low95: Scalars['Float']['output'];
  median: Scalars['Float']['output'];
};

/** What a member may do in a project; each role grants a fixed set (the server's role table). Screens read Project.myPermissions to hide or disable actions; the server checks every request itself. */
export type Permission =
  /** Start and cancel site age model runs. */
  | 'AGE_MODEL_RUN'
  /** Read the audit trail. */
  | 'AUDIT_READ'
  /** Create, edit and delete correlation hypotheses and ties. */
  | 'CORRELATION_WRITE'
  /** Members, roles, invitations. */
  | 'MEMBERS_MANAGE'
  /** Read everything in the project. */
  | 'PROJECT_READ'
  /** Project-wide settings, such as refreshing stale results automatically. */
  | 'PROJECT_SETTINGS'
  /** Start and cancel recurrence analyses. */
  | 'RECURRENCE_RUN'
  /** Freeze releases. */
  | 'RELEASE_CREATE'
  /** Ask for stale results to be re-run (each kind still needs its own run permission). */
  | 'RESULTS_REFRESH'
  /** Segments, sites, units, event horizons, samples, imports, attachments, core logs. */
  | 'STRATIGRAPHY_WRITE';

/** A study: all data belongs to exactly one project. */
export type Project = {
  __typename?: 'Project';
  createdAt: Scalars['DateTime']['output'];
  description?: Maybe<Scalars['String']['output']>;
  /** The sites that use a chosen run downstream rather than simply their newest successful run, along strike. */
  downstreamRunChoices: Array<DownstreamRunChoice>;
  hypotheses: Array<Hypothesis>;
  id: Scalars['ID']['output'];
  invitations: Array<Invitation>;
  members: Array<Membership>;
  /** What the caller's role allows in this project, from the server's role table. */
  myPermissions: Array<Permission>;
  /** The caller's role in this project. */
  myRole: Role;
  name: Scalars['String']['output'];
  preferredHypothesis?: Maybe<Hypothesis>;
  recurrenceAnalyses: Array<RecurrenceAnalysis>;
  /** The project's latest refreshes, newest first (at most 10). */
  refreshPlans: Array<RefreshPlan>;
  refreshSettings: RefreshSettings;
  releases: Array<Release>;
  segments: Array<Segment>;
  sites: Array<Site>;
  tectonicSetting: TectonicSetting;
};

export type Query = {
  __typename?: 'Query';
  ageModelRun: AgeModelRun;
  auditTrail: AuditConnection;
  /** Calibrate a conventional radiocarbon age (any signed-in user). */
  calibrate: Calibration;
  /** Turn a luminescence age (years before its measurement year) into cal BP. */
  calibrateLuminescence: Calibration;
  /** A calibration curve's tabulated values on a calendar range (for the calibration view). */
  calibrationCurveBand: Array<CurveBandPoint>;
  /** Calibration curves usable in a project: the built-ins and any installed ones. */
  calibrationCurves: Array<CalibrationCurveInfo>;
  /** The event ladder: every site of a project with its events' posterior densities. */
  eventLadder: EventLadder;
  fitRenewal: RenewalFit;
  hypothesis: Hypothesis;
  /** What an invitation link can still do, asked before its form is shown (public: the token is the key). */
  invitationLink: InvitationLink;
  jointAgeModelRun: JointAgeModelRun;
  /** The signed-in user. */
  me: User;
  project: Project;
  /** Projects the caller is a member of. */
  projects: Array<Project>;
  recurrenceAnalysis: RecurrenceAnalysis;
  /** Two finished analyses side by side (typically one setting on two hypotheses), with their differences. */
  recurrenceComparison: RecurrenceComparison;
  refreshPlan: RefreshPlan;
  release: Release;
  releaseDiff: ReleaseDiff;
  /** Posterior ranges of one renewal model's parameters and window probabilities for intervals known exactly (no project data; 4,000 parameter draws). */
  renewalForecast: RenewalForecast;
  renewalProbability: RenewalProbability;
  sample: Sample;
  segment: Segment;
  /** A segment's regional events under a hypothesis, and which count under a rule: what a segment analysis would use. */
  segmentEventTable: SegmentEventTable;
  site: Site;
  /** Proposed ties between two cores' turbidites, top down, in order down both cores (any member). */
  tieSuggestions: Array<TieSuggestion>;
};


export type QueryAgeModelRunArgs = {
  id: Scalars['ID']['input'];
};


export type QueryAuditTrailArgs = {
  input: AuditTrailInput;
};


export type QueryCalibrateArgs = {
  input: CalibrateInput;
};


export type QueryCalibrateLuminescenceArgs = {
  input: CalibrateLuminescenceInput;
};


export type QueryCalibrationCurveBandArgs = {
  curve: CurveCode;
  olderCalBp: Scalars['Int']['input'];
  youngerCalBp: Scalars['Int']['input'];
};


export type QueryEventLadderArgs = {
  projectId: Scalars['ID']['input'];
};


export type QueryFitRenewalArgs = {
  input: FitRenewalInput;
};


export type QueryHypothesisArgs = {
  id: Scalars['ID']['input'];
};


export type QueryInvitationLinkArgs = {
  token: Scalars['String']['input'];
};


export type QueryJointAgeModelRunArgs = {
  id: Scalars['ID']['input'];
};


export type QueryProjectArgs = {
  id: Scalars['ID']['input'];
};


export type QueryRecurrenceAnalysisArgs = {
  id: Scalars['ID']['input'];
};


export type QueryRecurrenceComparisonArgs = {
  analysisAId: Scalars['ID']['input'];
  analysisBId: Scalars['ID']['input'];
};


export type QueryRefreshPlanArgs = {
  id: Scalars['ID']['input'];
};


export type QueryReleaseArgs = {
  id: Scalars['ID']['input'];
};


export type QueryReleaseDiffArgs = {
  fromId: Scalars['ID']['input'];
  toId: Scalars['ID']['input'];
};


export type QueryRenewalForecastArgs = {
  input: RenewalForecastInput;
};


export type QueryRenewalProbabilityArgs = {
  input: RenewalProbabilityInput;
};


export type QuerySampleArgs = {
  id: Scalars['ID']['input'];
};


export type QuerySegmentArgs = {
  id: Scalars['ID']['input'];
};


export type QuerySegmentEventTableArgs = {
  input: SegmentEventTableInput;
};


export type QuerySiteArgs = {
  id: Scalars['ID']['input'];
};


export type QueryTieSuggestionsArgs = {
  input: TieSuggestionsInput;
};

/** A median with its 2.5-97.5 % Monte Carlo range. */
export type RangeEstimate = {
  __typename?: 'RangeEstimate';
  high95: Scalars['Float']['output'];
  low95: Scalars['Float']['output'];
  median: Scalars['Float']['output'];
};

/** One recorded input of a derived result. */
export type RecordedInput = {
  __typename?: 'RecordedInput';
  id: Scalars['ID']['output'];
  kind: ResultInputKind;
  /** Its name when it was used. */
  name: Scalars['String']['output'];
  /** The site column revision or hypothesis version read; null for a run. */
  revision?: Maybe<Scalars['Int']['output']>;
};

/** Interval statistics, renewal fits and forecasts for a segment or site, with their inputs. */
export type RecurrenceAnalysis = {
  __typename?: 'RecurrenceAnalysis';
  aperiodicity?: Maybe<RangeEstimate>;
  /** The caution every recurrence figure carries. */
  caution: Scalars['String']['output'];
  createdAt: Scalars['DateTime']['output'];
  curves: Array<ModelCurves>;
  draws: Scalars['Int']['output'];
  eventCount?: Maybe<Scalars['Int']['output']>;
  /** The event table a segment analysis used, with its rule and weights; null for a site analysis and analyses stored before it. */
  eventTable?: Maybe<SegmentEventTable>;
  finishedAt?: Maybe<Scalars['DateTime']['output']>;
  forecastStartYear: Scalars['Int']['output'];
  histogram: Array<HistogramBin>;
  hypothesis?: Maybe<Hypothesis>;
  hypothesisVersion?: Maybe<Scalars['Int']['output']>;
  id: Scalars['ID']['output'];
  /** The runs, hypothesis version and recorded inputs it was computed from. */
  inputs: RecurrenceInputs;
  intervals: Array<IntervalEstimate>;
  lastEventMedianCalBp?: Maybe<Scalars['Float']['output']>;
  meanRecurrence?: Maybe<RangeEstimate>;
  medianRecurrence?: Maybe<RangeEstimate>;
  message?: Maybe<Scalars['String']['output']>;
  /** Per draw, the models' probabilities weighted by that draw's Akaike weights from AICc (model averaging, Burnham & Anderson 2002); empty in older analyses. */
  modelAveraged: Array<WindowProbability>;
  modelComparisonNote?: Maybe<Scalars['String']['output']>;
  models: Array<ModelResult>;
  openInterval?: Maybe<RangeEstimate>;
  /** How the renewal parameters were drawn and under which priors; null in older analyses. */
  parameterNote?: Maybe<Scalars['String']['output']>;
  poisson: Array<WindowProbability>;
  progress: Scalars['Float']['output'];
  project: Project;
  /** Events in a draw's record (median and 95 % range) when inclusion weights make it vary; null otherwise. */
  recordEvents?: Maybe<RangeEstimate>;
  release?: Maybe<Release>;
  sdRecurrence?: Maybe<RangeEstimate>;
  seed: Scalars['Int']['output'];
  segment?: Maybe<Segment>;
  settings: Scalars['JSON']['output'];
  site?: Maybe<Site>;
  /** Where its event ages came from (the joint run, if any, is in inputs.jointRun). */
  source: RecurrenceSource;
  /** True when any input changed after the analysis was queued, directly or through the runs it used. */
  stale: Scalars['Boolean']['output'];
  /** Why it is stale; empty while it is up to date. */
  staleReasons: Array<StaleReason>;
  status: JobStatus;
  windowsYears: Array<Scalars['Float']['output']>;
};

/** Two finished recurrence analyses side by side. */
export type RecurrenceComparison = {
  __typename?: 'RecurrenceComparison';
  analysisA: RecurrenceAnalysis;
  analysisB: RecurrenceAnalysis;
  caution: Scalars['String']['output'];
  events: Array<ComparedEventRow>;
  note: Scalars['String']['output'];
  probabilities: Array<ComparedProbability>;
  /** Settings in which the two differ; empty when one setting was run on two hypotheses. */
  settingDifferences: Array<Scalars['String']['output']>;
  statistics: Array<ComparedStatistic>;
};

/** What a recurrence analysis was computed from. */
export type RecurrenceInputs = {
  __typename?: 'RecurrenceInputs';
  /** The site age model runs whose event ages it used (empty for a run that has since been deleted). */
  ageModelRuns: Array<AgeModelRun>;
  /** The correlation hypothesis of a segment analysis; null for a single site, or once deleted. */
  hypothesis?: Maybe<Hypothesis>;
  /** The hypothesis version it used. */
  hypothesisVersion?: Maybe<Scalars['Int']['output']>;
  /** The joint age model run it used; null unless it ran on one. */
  jointRun?: Maybe<JointRunReference>;
  /** Every recorded input, with the revision or version read and its name. */
  recorded: Array<RecordedInput>;
};

/** Where a recurrence analysis' event ages come from. */
export type RecurrenceSource =
  /** A segment analysis without a fresh joint run: each regional event drawn from its combined density (the product of its members' site posteriors), in median order. */
  | 'COMBINED_DENSITIES'
  /**
   * A segment analysis under a hypothesis with a fresh joint age model run: each draw is one joint
   * draw of the regional events from that run, so their order and correlation are kept.
   */
  | 'JOINT_RUN'
  /** A site analysis: the joint event draws of the site's age model run. */
  | 'SITE_RUN';

/**
 * One refresh of a project's stale results: the whole plan in dependency order (steps: queued now,
 * waiting for the runs they need, ended) with its progress, and what it skipped and why. The result
 * lists hold the fresh results queued so far; a step still waiting for the runs it needs (an
 * analysis waiting for its site's fresh age model) is listed in steps with what it waits for, and
 * adds its fresh result to the list when it starts. A failed step stops only the steps that need it.
 */
export type RefreshPlan = {
  __typename?: 'RefreshPlan';
  /** Fresh site age model runs queued by this refresh. */
  ageModelRuns: Array<AgeModelRun>;
  /** True when the project's automatic refresh started it. */
  automatic: Scalars['Boolean']['output'];
  createdAt: Scalars['DateTime']['output'];
  id: Scalars['ID']['output'];
  /** Fresh joint age model runs queued by this refresh. */
  jointRuns: Array<JointRunReference>;
  /** How far it has come. */
  progress: RefreshProgress;
  /** Fresh recurrence analyses queued by this refresh. */
  recurrenceAnalyses: Array<RecurrenceAnalysis>;
  requestedBy?: Maybe<User>;
  /** Stale results it did not re-run, and why. */
  skipped: Array<SkippedRefresh>;
  /** ACTIVE while a step waits or runs, then FINISHED. */
  status: Scalars['String']['output'];
  steps: Array<RefreshStep>;
};

/** How far a refresh has come: its steps by status, and the stale results it skipped. */
export type RefreshProgress = {
  __typename?: 'RefreshProgress';
  /** Not started because a step they need failed or was not started. */
  blocked: Scalars['Int']['output'];
  /** Fresh result failed or could not be queued. */
  failed: Scalars['Int']['output'];
  /** Share of the steps that ended (succeeded, failed or blocked), 0 to 1; 1 for a plan with no steps. */
  fraction: Scalars['Float']['output'];
  /** Fresh result queued or running (or being queued). */
  running: Scalars['Int']['output'];
  /** Stale results left out of the plan (see skipped). */
  skipped: Scalars['Int']['output'];
  /** Fresh result computed. */
  succeeded: Scalars['Int']['output'];
  /** Steps in the plan. */
  total: Scalars['Int']['output'];
  /** Waiting for the steps they need. */
  waiting: Scalars['Int']['output'];
};

/** Whether a project refreshes stale results by itself after each change. */
export type RefreshSettings = {
  __typename?: 'RefreshSettings';
  automatic: Scalars['Boolean']['output'];
  /** Seconds without a further change before the automatic refresh starts. */
  debounceSeconds: Scalars['Int']['output'];
};

/** One stale result of a refresh and the fresh result queued for it. */
export type RefreshStep = {
  __typename?: 'RefreshStep';
  /** Ids of the steps it waits for. */
  dependsOn: Array<Scalars['ID']['output']>;
  /** The fresh result, once queued. */
  freshId?: Maybe<Scalars['ID']['output']>;
  id: Scalars['ID']['output'];
  /** ageModelRun, jointRun or recurrenceAnalysis. */
  kind: Scalars['String']['output'];
  /** What it refreshes, in words. */
  label: Scalars['String']['output'];
  /** Why it failed or was blocked. */
  message?: Maybe<Scalars['String']['output']>;
  /** 1 site age model runs, 2 joint runs, 3 recurrence analyses. */
  stage: Scalars['Int']['output'];
  /** The stale result re-run with its settings and seed. */
  staleId: Scalars['ID']['output'];
  /** WAITING (for the steps it needs), STARTING, QUEUED (fresh result queued or running), SUCCEEDED, FAILED, or BLOCKED (a step it needs failed). */
  status: Scalars['String']['output'];
  /** What it still waits for, in words: the steps it needs that have not succeeded yet (empty once it may start). */
  waitingFor: Array<Scalars['String']['output']>;
};

/** A connected group of tied events: one inferred earthquake. */
export type RegionalEvent = {
  __typename?: 'RegionalEvent';
  /** The age model runs its members' ages came from: each member site's run used downstream, Site.downstreamRun (stale ones say so). */
  ageModelRuns: Array<AgeModelRun>;
  /** JOINT_RUN when a fresh joint run dates it (then its joint age is the one to show), else COMBINED_DENSITIES. */
  ageShown: RegionalEventAgeSource;
  chiSquare?: Maybe<ChiSquareTest>;
  combinedDensity: Array<DensityPoint>;
  combinedHpd95: Array<HpdRange>;
  combinedMedianCalBp?: Maybe<Scalars['Float']['output']>;
  /** 0-1: how well the members' age densities agree (1 = identical). */
  concordance?: Maybe<Scalars['Float']['output']>;
  /** True when the concordance is below concordanceThreshold. */
  concordanceLow: Scalars['Boolean']['output'];
  /**
   * The concordance below which a group of this many members is flagged: exp(-chi2_0.95(n-1)/2),
   * so a true same-event group is flagged about 5 % of the time whatever its size. Null for one member.
   */
  concordanceThreshold?: Maybe<Scalars['Float']['output']>;
  id: Scalars['ID']['output'];
  /** The 95.4 % HPD ranges of its joint age; empty without a fresh joint run. */
  jointHpd95: Array<HpdRange>;
  /** The median of its joint age in the hypothesis' fresh joint run; null without one. */
  jointMedianCalBp?: Maybe<Scalars['Float']['output']>;
  /** The fresh joint run the joint age comes from; null without one. */
  jointRun?: Maybe<JointAgeModelRun>;
  /** Mw from the minimum rupture length (the site span), so a lower bound. */
  magnitude?: Maybe<MagnitudeEstimate>;
  /**
   * Mw from rupture area, the site span times the down-dip width of the member sites' segment(s)
   * (the narrowest when they differ), by the Strasser, Arango & Bommer (2010) interface area
   * relation; null when no member's segment has a width.
   */
  magnitudeFromArea?: Maybe<MagnitudeEstimate>;
  /** Mw from the members' mean measured displacement by Wells & Coppersmith (1994), all slip types; null without displacements. */
  magnitudeFromDisplacement?: Maybe<MagnitudeEstimate>;
  members: Array<EventHorizon>;
  /** Along-strike span of the member sites, km: a minimum rupture length. */
  ruptureLengthKm?: Maybe<Scalars['Float']['output']>;
  /** Each member's measured size (subsidence, displacement, bed thickness) along strike. */
  sizeProfile: Array<SizeEvidencePoint>;
  warnings: Array<Scalars['String']['output']>;
};

/** Which age of a regional event is shown as its age. */
export type RegionalEventAgeSource =
  /** The normalised product of the members' site posteriors (combinedMedianCalBp, combinedHpd95). */
  | 'COMBINED_DENSITIES'
  /** The hypothesis' fresh joint age model run (succeeded, nothing changed since). */
  | 'JOINT_RUN';

/** A frozen, numbered snapshot of a project's data for citation. */
export type Release = {
  __typename?: 'Release';
  createdAt: Scalars['DateTime']['output'];
  createdBy: User;
  id: Scalars['ID']['output'];
  note: Scalars['String']['output'];
  number: Scalars['Int']['output'];
  project: Project;
  segments: Array<ReleasedSegment>;
  /** The sites as frozen, each with its column and samples as they then stood. */
  sites: Array<ReleasedSite>;
};

export type ReleaseChange = {
  __typename?: 'ReleaseChange';
  change: Scalars['String']['output'];
  label: Scalars['String']['output'];
  objectId: Scalars['ID']['output'];
  objectType: Scalars['String']['output'];
};

export type ReleaseDiff = {
  __typename?: 'ReleaseDiff';
  changes: Array<ReleaseChange>;
  from: Release;
  to: Release;
};

/** An event horizon as frozen in a release. */
export type ReleasedEventHorizon = {
  __typename?: 'ReleasedEventHorizon';
  evidence: Array<Scalars['String']['output']>;
  id: Scalars['ID']['output'];
  name: Scalars['String']['output'];
  notes?: Maybe<Scalars['String']['output']>;
  quality: Scalars['Int']['output'];
  unitAboveId: Scalars['ID']['output'];
  unitBelowId: Scalars['ID']['output'];
};

/** A sample's measured fields as frozen in a release (calibrations are recomputed from them). */
export type ReleasedSample = {
  __typename?: 'ReleasedSample';
  ageRelation: AgeRelation;
  c14Age?: Maybe<Scalars['Float']['output']>;
  c14Error?: Maybe<Scalars['Float']['output']>;
  calendarAgeBp?: Maybe<Scalars['Float']['output']>;
  calendarErrorYears?: Maybe<Scalars['Float']['output']>;
  curve?: Maybe<CurveCode>;
  delta13C?: Maybe<Scalars['Float']['output']>;
  deltaR?: Maybe<Scalars['Float']['output']>;
  deltaRError?: Maybe<Scalars['Float']['output']>;
  /** The Delta-R entry the sample's offset comes from (samples of a site naming one source share one offset); null when not given or frozen before bundle format 2. */
  deltaRSource?: Maybe<Scalars['String']['output']>;
  depthM?: Maybe<Scalars['Float']['output']>;
  excluded: Scalars['Boolean']['output'];
  exclusionReason?: Maybe<Scalars['String']['output']>;
  id: Scalars['ID']['output'];
  /** The sample's own inheritance or intrusion scale (years); null takes its material's default, or was frozen before bundle format 2. */
  inheritanceScaleYears?: Maybe<Scalars['Float']['output']>;
  labCode: Scalars['String']['output'];
  material: SampleMaterial;
  measurementYear?: Maybe<Scalars['Int']['output']>;
  method: DatingMethod;
  notes?: Maybe<Scalars['String']['output']>;
  unitId: Scalars['ID']['output'];
};

/**
 * A segment as frozen in a release. Every field of the Released types comes from the release's
 * snapshot, never from today's data; ids are those of the live records, which may since have
 * changed or gone.
 */
export type ReleasedSegment = {
  __typename?: 'ReleasedSegment';
  endKm: Scalars['Float']['output'];
  id: Scalars['ID']['output'];
  name: Scalars['String']['output'];
  notes?: Maybe<Scalars['String']['output']>;
  startKm: Scalars['Float']['output'];
};

/** A site as frozen in a release, with its column and samples. */
export type ReleasedSite = {
  __typename?: 'ReleasedSite';
  alongStrikeKm: Scalars['Float']['output'];
  elevationM?: Maybe<Scalars['Float']['output']>;
  /** Event horizons, oldest first. */
  eventHorizons: Array<ReleasedEventHorizon>;
  id: Scalars['ID']['output'];
  kind: SiteKind;
  latitude: Scalars['Float']['output'];
  longitude: Scalars['Float']['output'];
  name: Scalars['String']['output'];
  notes?: Maybe<Scalars['String']['output']>;
  /** Samples by unit (oldest first), then lab code. */
  samples: Array<ReleasedSample>;
  segment?: Maybe<ReleasedSegment>;
  /** Units in stratigraphic order, oldest (position 1) first. */
  units: Array<ReleasedUnit>;
  waterDepthM?: Maybe<Scalars['Float']['output']>;
};

/** A unit as frozen in a release. */
export type ReleasedUnit = {
  __typename?: 'ReleasedUnit';
  /** Estimated thickness of mud (m) the unit's base eroded; null when not given or frozen before bundle format 2. */
  basalErosionM?: Maybe<Scalars['Float']['output']>;
  baseDepthM: Scalars['Float']['output'];
  facies: Facies;
  id: Scalars['ID']['output'];
  name: Scalars['String']['output'];
  notes?: Maybe<Scalars['String']['output']>;
  position: Scalars['Int']['output'];
  topDepthM: Scalars['Float']['output'];
};

export type RenewalFit = {
  __typename?: 'RenewalFit';
  aic: Scalars['Float']['output'];
  /** AIC with the small-sample correction of Hurvich & Tsai (1989), n = intervals with the open one; null when n <= k + 1. */
  aicc?: Maybe<Scalars['Float']['output']>;
  aperiodicity: Scalars['Float']['output'];
  logLikelihood: Scalars['Float']['output'];
  meanRecurrenceYears: Scalars['Float']['output'];
  model: RenewalModel;
};

/** Posterior ranges of a renewal model given exactly known intervals. */
export type RenewalForecast = {
  __typename?: 'RenewalForecast';
  /** Aperiodicity (coefficient of variation of the interval); 1 for POISSON. */
  aperiodicity: RangeEstimate;
  /** Draws taken by importance resampling because the open interval is far beyond the record (0 normally). */
  approximateDraws: Scalars['Int']['output'];
  /** The caution every recurrence figure carries. */
  caution: Scalars['String']['output'];
  /** Number of parameter draws. */
  draws: Scalars['Int']['output'];
  /** Mean recurrence, years: posterior median and central 95 % range. */
  meanRecurrence: RangeEstimate;
  model: RenewalModel;
  /** The priors and how the draws were made. */
  priorNote: Scalars['String']['output'];
  /** Conditional probability of the next event within each window, given the open interval. */
  probabilities: Array<WindowProbability>;
};

/**
 * A stateless forecast: one renewal model's parameters drawn from their posterior given exactly known
 * intervals and the censored open interval (reference priors, aperiodicity below 5; the priors are in
 * `priorNote`), and each draw's conditional probability of the next event in each window.
 */
export type RenewalForecastInput = {
  /** Closed inter-event times, years (2 to 1,000 values, each up to 1,000,000). */
  intervalsYears: Array<Scalars['Float']['input']>;
  model: RenewalModel;
  /** Years since the last event at the start of the windows (right-censored). */
  openIntervalYears: Scalars['Float']['input'];
  /** Seed of the parameter draws (default 1): the same input and seed give the same answer. */
  seed?: InputMaybe<Scalars['Int']['input']>;
  /** Forecast window lengths, years (1 to 10). */
  windowsYears: Array<Scalars['Float']['input']>;
};

/** Renewal model of earthquake recurrence. */
export type RenewalModel =
  /** Brownian Passage Time: the inverse Gaussian (Matthews, Ellsworth & Reasenberg 2002). */
  | 'BPT'
  | 'LOGNORMAL'
  /** Exponential inter-event times (time-independent). */
  | 'POISSON'
  | 'WEIBULL';

export type RenewalProbability = {
  __typename?: 'RenewalProbability';
  conditionalProbability: Scalars['Float']['output'];
  hazardRatePerYear: Scalars['Float']['output'];
  poissonProbability: Scalars['Float']['output'];
};

export type RenewalProbabilityInput = {
  /** Coefficient of variation; ignored for POISSON. */
  aperiodicity: Scalars['Float']['input'];
  /** Years since the last event at the start of the window. */
  elapsedYears: Scalars['Float']['input'];
  meanRecurrenceYears: Scalars['Float']['input'];
  model: RenewalModel;
  windowYears: Scalars['Float']['input'];
};

/** The posterior of one Delta-R source's local offset, 14C years. */
export type ReservoirOffsetPosterior = {
  __typename?: 'ReservoirOffsetPosterior';
  high95Years: Scalars['Float']['output'];
  /** Central 95 % range (2.5 % and 97.5 % quantiles). */
  low95Years: Scalars['Float']['output'];
  medianYears: Scalars['Float']['output'];
  /** True when the samples name the source (Sample.deltaRSource). */
  named: Scalars['Boolean']['output'];
  /** The prior: the entry's Delta-R and its 1-sigma error. */
  priorMeanYears: Scalars['Float']['output'];
  priorSdYears: Scalars['Float']['output'];
  /** The samples that share the offset. */
  samples: Array<Sample>;
  /** The source's name, or its Delta-R and error when the samples name none. */
  source: Scalars['String']['output'];
};

export type ResetPasswordInput = {
  password: Scalars['String']['input'];
  token: Scalars['String']['input'];
};

/** The kind of input a derived result was computed from. */
export type ResultInputKind =
  /** A site age model run. */
  | 'AGE_MODEL_RUN'
  /** A correlation hypothesis at one version. */
  | 'HYPOTHESIS'
  /** A joint age model run under a hypothesis. */
  | 'JOINT_RUN'
  /** A site's column: its units, event horizons and samples. */
  | 'SITE_COLUMN';

/** A member's role in one project; it decides what the member may change. */
export type Role =
  | 'ADMIN'
  | 'ANALYST'
  | 'CORRELATOR'
  | 'RESEARCHER'
  | 'VIEWER';

/** A dated sample and its lab values. */
export type Sample = {
  __typename?: 'Sample';
  ageRelation: AgeRelation;
  attachments: Array<Attachment>;
  /** Conventional radiocarbon age, 14C yr BP (Stuiver & Polach 1977). */
  c14Age?: Maybe<Scalars['Float']['output']>;
  /** 1-sigma error of the conventional age, 14C yr. */
  c14Error?: Maybe<Scalars['Float']['output']>;
  /** Luminescence: years before measurementYear; historical/tephra: centre of the calendar range, cal BP. */
  calendarAgeBp?: Maybe<Scalars['Float']['output']>;
  /** Luminescence: 1 sigma; historical/tephra: half-width of the range. */
  calendarErrorYears?: Maybe<Scalars['Float']['output']>;
  /** Calendar-age calibration, or null with calibrationError set when it cannot be calibrated. */
  calibration?: Maybe<Calibration>;
  calibrationError?: Maybe<Scalars['String']['output']>;
  curve?: Maybe<CurveCode>;
  delta13C?: Maybe<Scalars['Float']['output']>;
  deltaR?: Maybe<Scalars['Float']['output']>;
  deltaRError?: Maybe<Scalars['Float']['output']>;
  /**
   * Name of the regional Delta-R entry deltaR comes from. Marine samples of a site with the same
   * source share one reservoir offset in the age model; samples with no source share it when their
   * deltaR and deltaRError are identical.
   */
  deltaRSource?: Maybe<Scalars['String']['output']>;
  depthM?: Maybe<Scalars['Float']['output']>;
  excluded: Scalars['Boolean']['output'];
  exclusionReason?: Maybe<Scalars['String']['output']>;
  id: Scalars['ID']['output'];
  /** The scale the age model uses when inheritanceScaleYears is null: the default for the sample's material. */
  inheritanceScaleDefaultYears: Scalars['Float']['output'];
  /**
   * OLDER_THAN_DEPOSIT / YOUNGER_THAN_DEPOSIT samples: scale (mean, years) of the exponential prior on
   * the sample's inheritance (or intrusion) offset from its deposit, 1 to 10,000; null takes the
   * default for the material (inheritanceScaleDefaultYears).
   */
  inheritanceScaleYears?: Maybe<Scalars['Float']['output']>;
  labCode: Scalars['String']['output'];
  material: SampleMaterial;
  measurementYear?: Maybe<Scalars['Int']['output']>;
  method: DatingMethod;
  notes?: Maybe<Scalars['String']['output']>;
  site: Site;
  unit: Unit;
  version: Scalars['Int']['output'];
};

/** What was dated. */
export type SampleMaterial =
  | 'BENTHIC_FORAMS'
  | 'BULK_SEDIMENT'
  | 'DETRITAL_CHARCOAL'
  | 'IN_SITU_PLANT'
  | 'OTHER'
  | 'PLANKTIC_FORAMS'
  | 'PLANT_MACROFOSSIL'
  | 'SHELL';

/** The posterior of a sample's age offset from its deposit (sample age minus deposit age), years. */
export type SampleOffsetPosterior = {
  __typename?: 'SampleOffsetPosterior';
  /** Upper end of the central 95 % range (97.5 % quantile), years. */
  high95Years: Scalars['Float']['output'];
  /** Lower end of the central 95 % range (2.5 % quantile), years. */
  low95Years: Scalars['Float']['output'];
  medianYears: Scalars['Float']['output'];
  /** Scale (mean, years) of the exponential prior the run used for this sample. */
  scaleYears: Scalars['Float']['output'];
};

/** Posterior of one sample: its outlier probability and calendar age. */
export type SamplePosterior = {
  __typename?: 'SamplePosterior';
  hpd95: Array<HpdRange>;
  medianCalBp: Scalars['Float']['output'];
  /**
   * OLDER_THAN_DEPOSIT / YOUNGER_THAN_DEPOSIT samples: the posterior of sample age minus deposit age
   * (inheritance positive, intrusion negative) given the sample is not an outlier; null otherwise.
   */
  offset?: Maybe<SampleOffsetPosterior>;
  outlierProbability: Scalars['Float']['output'];
  sample: Sample;
};

/** A fault or subduction-zone segment with its along-strike extent. */
export type Segment = {
  __typename?: 'Segment';
  /** Down-dip width of the rupture plane, km: with it a regional event gets Mw from rupture area (length x width). */
  downDipWidthKm?: Maybe<Scalars['Float']['output']>;
  endKm: Scalars['Float']['output'];
  id: Scalars['ID']['output'];
  name: Scalars['String']['output'];
  notes?: Maybe<Scalars['String']['output']>;
  project: Project;
  sites: Array<Site>;
  startKm: Scalars['Float']['output'];
  version: Scalars['Int']['output'];
};

/** A segment's event table under a hypothesis and a counting rule. */
export type SegmentEventTable = {
  __typename?: 'SegmentEventTable';
  /** Events with an inclusion probability above 0. */
  countedEvents: Scalars['Int']['output'];
  /** Sum of the inclusion probabilities. */
  expectedEvents: Scalars['Float']['output'];
  hypothesisId: Scalars['ID']['output'];
  hypothesisName: Scalars['String']['output'];
  hypothesisVersion: Scalars['Int']['output'];
  /** How the rule and any weights enter the analysis, and which way each choice biases the recurrence. */
  note: Scalars['String']['output'];
  /** Young to old. */
  rows: Array<SegmentEventTableRow>;
  rule: CountingRule;
  segmentEndKm: Scalars['Float']['output'];
  segmentId: Scalars['ID']['output'];
  segmentName: Scalars['String']['output'];
  segmentStartKm: Scalars['Float']['output'];
  /** True when a counted event has a probability below 1, so the record varies between draws. */
  weighted: Scalars['Boolean']['output'];
};

export type SegmentEventTableInput = {
  countingRule?: InputMaybe<CountingRuleInput>;
  /** Default: the project's preferred hypothesis. */
  hypothesisId?: InputMaybe<Scalars['ID']['input']>;
  segmentId: Scalars['ID']['input'];
};

/** One site event of a regional event in a segment's event table. */
export type SegmentEventTableMember = {
  __typename?: 'SegmentEventTableMember';
  alongStrikeKm: Scalars['Float']['output'];
  eventHorizonId: Scalars['ID']['output'];
  eventName: Scalars['String']['output'];
  /** 1 (certain) to 4 (possible). */
  quality: Scalars['Int']['output'];
  /** The segment the site lies in, if any. */
  segmentId?: Maybe<Scalars['ID']['output']>;
  segmentName?: Maybe<Scalars['String']['output']>;
  siteId: Scalars['ID']['output'];
  siteName: Scalars['String']['output'];
};

/** One regional event recorded on the segment, with whether and how it counts. */
export type SegmentEventTableRow = {
  __typename?: 'SegmentEventTableRow';
  counted: Scalars['Boolean']['output'];
  /** Probability that the event is in a Monte Carlo draw's record: 0 when not counted, 1 without weights. */
  inclusionProbability: Scalars['Float']['output'];
  /** Its members as site and event, along strike. */
  label: Scalars['String']['output'];
  /** Median of the combined age, cal BP; null when the members share no year. */
  medianCalBp?: Maybe<Scalars['Float']['output']>;
  members: Array<SegmentEventTableMember>;
  /** Quality (1-4) of each member, in member order. */
  qualities: Array<Scalars['Int']['output']>;
  /** Why it is in or out, in words. */
  reason: Scalars['String']['output'];
  /** The regional event's stable id (its sorted member ids): the same event under any hypothesis has the same id. */
  regionalEventId: Scalars['ID']['output'];
  /** The segments its member sites lie in. */
  segmentNames: Array<Scalars['String']['output']>;
  /** Share (0-1) of the segment's along-strike extent spanned by the member sites (all of them, also beyond the segment). */
  spanShare: Scalars['Float']['output'];
  /** Recorded at (or beyond) both outermost sites of the segment: as through-going as the sites can show. */
  throughGoing: Scalars['Boolean']['output'];
  /** Confidence (1-4) of each tie inside the event. */
  tieConfidences: Array<Scalars['Int']['output']>;
  /** No member has any tie in the hypothesis. */
  untied: Scalars['Boolean']['output'];
};

export type SetMemberRoleInput = {
  projectId: Scalars['ID']['input'];
  role: Role;
  userId: Scalars['ID']['input'];
};

export type SetRefreshSettingsInput = {
  automatic: Scalars['Boolean']['input'];
  /** 10 to 3600 seconds (default 60). */
  debounceSeconds?: InputMaybe<Scalars['Int']['input']>;
  projectId: Scalars['ID']['input'];
};

/** A place with evidence: a trench, core, outcrop, marsh or lake site. */
export type Site = {
  __typename?: 'Site';
  ageModelRuns: Array<AgeModelRun>;
  alongStrikeKm: Scalars['Float']['output'];
  attachments: Array<Attachment>;
  /** Physical-property logs of this core, by name. */
  coreLogs: Array<CoreLog>;
  /**
   * The age model run whose event ages the ladder, correlation checks, regional events, site
   * recurrence and the refresh use: the chosen run (downstreamRunChoice) when there is one, else the
   * newest successful run; null while the site has no successful run.
   */
  downstreamRun?: Maybe<AgeModelRun>;
  /** The chosen run used downstream; null when the site follows its newest successful run. */
  downstreamRunChoice?: Maybe<DownstreamRunChoice>;
  /** Ground elevation (m above sea level) for land sites. */
  elevationM?: Maybe<Scalars['Float']['output']>;
  /** Event horizons, oldest first. */
  eventHorizons: Array<EventHorizon>;
  id: Scalars['ID']['output'];
  kind: SiteKind;
  latestAgeModelRun?: Maybe<AgeModelRun>;
  /** WGS84 latitude, degrees. */
  latitude: Scalars['Float']['output'];
  /** WGS84 longitude, degrees. */
  longitude: Scalars['Float']['output'];
  name: Scalars['String']['output'];
  notes?: Maybe<Scalars['String']['output']>;
  project: Project;
  samples: Array<Sample>;
  segment?: Maybe<Segment>;
  /** Units in stratigraphic order, oldest (position 1) first. */
  units: Array<Unit>;
  version: Scalars['Int']['output'];
  /** Water depth (m) for cores. */
  waterDepthM?: Maybe<Scalars['Float']['output']>;
};

/** Kind of place that holds paleoseismic evidence. */
export type SiteKind =
  | 'CORE'
  | 'LAKE'
  | 'MARSH'
  | 'OUTCROP'
  | 'TRENCH';

/** One site's measured size of a regional event, for the along-strike profile. */
export type SizeEvidencePoint = {
  __typename?: 'SizeEvidencePoint';
  alongStrikeKm?: Maybe<Scalars['Float']['output']>;
  /** Event-bed thickness at a core site, m. */
  bedThicknessM?: Maybe<Scalars['Float']['output']>;
  displacementErrorM?: Maybe<Scalars['Float']['output']>;
  /** Displacement, m, and its 1-sigma error. */
  displacementM?: Maybe<Scalars['Float']['output']>;
  eventHorizon: EventHorizon;
  site: Site;
  subsidenceErrorM?: Maybe<Scalars['Float']['output']>;
  /** Subsidence, m, and its 1-sigma error. */
  subsidenceM?: Maybe<Scalars['Float']['output']>;
};

/** A stale result a refresh did not re-run, and why (the requester's role, or it waits for something else). */
export type SkippedRefresh = {
  __typename?: 'SkippedRefresh';
  /** The stale result's id. */
  id: Scalars['ID']['output'];
  kind: Scalars['String']['output'];
  /** What it is, in words. */
  label: Scalars['String']['output'];
  reason: Scalars['String']['output'];
};

/** One input that changed after a result was computed: the reason the result is stale. */
export type StaleReason = {
  __typename?: 'StaleReason';
  /** The changed site, hypothesis or run. */
  inputId: Scalars['ID']['output'];
  inputKind: ResultInputKind;
  /** Its name (as it was used, when it has since been deleted). */
  inputName: Scalars['String']['output'];
  /** What changed, in words (names, not ids). */
  message: Scalars['String']['output'];
  /** The results the change reached this one through, nearest first; empty when the input is direct. */
  via: Array<Scalars['String']['output']>;
};

export type StartAgeModelRunInput = {
  chains?: InputMaybe<Scalars['Int']['input']>;
  /** How ages relate to depth (default ORDER_ONLY). HEMIPELAGIC_RATE needs hemipelagic mud units and sample depths. */
  depthModel?: InputMaybe<DepthModel>;
  /**
   * HEMIPELAGIC_RATE only: the prior mean hemipelagic accumulation rate, cm per thousand years. When
   * left out it is measured from the dated levels (their median ages over their event-free depths).
   */
  hemipelagicRateCmPerKyr?: InputMaybe<Scalars['Float']['input']>;
  /**
   * Scale of the exponential prior on inherited (and intruded) age offsets, years, for samples that
   * give none of their own (Sample.inheritanceScaleYears). Left out, each such sample takes the
   * default for its material (Sample.inheritanceScaleDefaultYears).
   */
  inheritanceScaleYears?: InputMaybe<Scalars['Float']['input']>;
  /** Iterations per chain after burn-in. */
  iterations?: InputMaybe<Scalars['Int']['input']>;
  /**
   * Prior probability that any one sample is an outlier (default 0.05): the few per cent of dates
   * the trade expects to disagree with their context beyond their quoted errors.
   */
  outlierPrior?: InputMaybe<Scalars['Float']['input']>;
  /**
   * Scale of an outlier's unknown shift, years (default 500, from 10 to 10,000): an outlying
   * sample's age is read as its likelihood shifted by an amount with a two-sided exponential prior
   * of this mean absolute size, so outlier probabilities depend on this stated scale only.
   */
  outlierShiftScaleYears?: InputMaybe<Scalars['Float']['input']>;
  seed?: InputMaybe<Scalars['Int']['input']>;
  siteId: Scalars['ID']['input'];
};

export type StartJointAgeModelRunInput = {
  /** Chains, each a job of its own so several workers run them at once: 2 to 16 (default 4). */
  chains?: InputMaybe<Scalars['Int']['input']>;
  /** The hypothesis whose tied sites are modelled together; refused while it has an order loop (Hypothesis.orderConflicts). */
  hypothesisId: Scalars['ID']['input'];
  /** Sweeps per chain after burn-in: 500 to 200,000 (default 3,000). Burn-in is a third of this, from 500 to 4,000; about 1,000 draws per chain are kept. */
  iterations?: InputMaybe<Scalars['Int']['input']>;
  seed?: InputMaybe<Scalars['Int']['input']>;
};

export type StartRecurrenceAnalysisInput = {
  /** Which of the segment's events count (segment analyses only; refused for a site). */
  countingRule?: InputMaybe<CountingRuleInput>;
  draws?: InputMaybe<Scalars['Int']['input']>;
  /** Start of the forecast windows, calendar year CE (default: this year). */
  forecastStartYear?: InputMaybe<Scalars['Int']['input']>;
  hypothesisId?: InputMaybe<Scalars['ID']['input']>;
  /** Pin the analysis to a release. */
  releaseId?: InputMaybe<Scalars['ID']['input']>;
  seed?: InputMaybe<Scalars['Int']['input']>;
  segmentId?: InputMaybe<Scalars['ID']['input']>;
  siteId?: InputMaybe<Scalars['ID']['input']>;
  windowsYears?: InputMaybe<Array<Scalars['Float']['input']>>;
};

/** Tectonic setting of a project's faults; chooses the rupture-scaling relation. */
export type TectonicSetting =
  | 'CRUSTAL'
  | 'SUBDUCTION_INTERFACE';

/** A link between two site events asserting they record the same earthquake. */
export type Tie = {
  __typename?: 'Tie';
  confidence: Scalars['Int']['output'];
  eventA: EventHorizon;
  eventB: EventHorizon;
  evidence: Array<Scalars['String']['output']>;
  id: Scalars['ID']['output'];
  note?: Maybe<Scalars['String']['output']>;
};

/**
 * A proposed tie between two cores' turbidites, from their logs' shared channels and the order of
 * their beds: each bed's log signature is compared by dynamic time warping (Sakoe & Chiba 1978)
 * and the pairs are chosen by an order-keeping alignment (Needleman & Wunsch 1970). Nothing is
 * tied until a correlator accepts it (addTie with evidence "log match").
 */
export type TieSuggestion = {
  __typename?: 'TieSuggestion';
  /** The log channels compared. */
  channels: Array<Scalars['String']['output']>;
  /** The event at the base of the bed in the first core. */
  eventA: EventHorizon;
  /** The event at the base of the bed in the second core. */
  eventB: EventHorizon;
  /** Similarity of the two beds' log signatures, 0-1 (pairs below 0.5 are not proposed). */
  score: Scalars['Float']['output'];
  /** True when the hypothesis already ties this pair (it anchored the alignment). */
  tied: Scalars['Boolean']['output'];
};

export type TieSuggestionsInput = {
  hypothesisId: Scalars['ID']['input'];
  /** Two different cores of the hypothesis's project, each with a core log; their logs must share a channel name. */
  siteAId: Scalars['ID']['input'];
  siteBId: Scalars['ID']['input'];
};

/** A stratigraphic unit in a site's column. */
export type Unit = {
  __typename?: 'Unit';
  /** Estimated thickness (m) of mud the unit's base eroded from the unit below, e.g. a turbidite's scour; null when not estimated. */
  basalErosionM?: Maybe<Scalars['Float']['output']>;
  baseDepthM: Scalars['Float']['output'];
  facies: Facies;
  id: Scalars['ID']['output'];
  name: Scalars['String']['output'];
  notes?: Maybe<Scalars['String']['output']>;
  /** Order from the base: 1 is the oldest unit. */
  position: Scalars['Int']['output'];
  site: Site;
  topDepthM: Scalars['Float']['output'];
  version: Scalars['Int']['output'];
};

export type UpdateEventHorizonInput = {
  /** 1-sigma error of displacementM, m (> 0). */
  displacementErrorM?: InputMaybe<Scalars['Float']['input']>;
  /** Coseismic displacement, m (>= 0); null clears it. */
  displacementM?: InputMaybe<Scalars['Float']['input']>;
  evidence?: InputMaybe<Array<Scalars['String']['input']>>;
  name?: InputMaybe<Scalars['String']['input']>;
  notes?: InputMaybe<Scalars['String']['input']>;
  quality?: InputMaybe<Scalars['Int']['input']>;
  /** 1-sigma error of subsidenceM, m (> 0). */
  subsidenceErrorM?: InputMaybe<Scalars['Float']['input']>;
  /** Coseismic subsidence, m; null clears it. */
  subsidenceM?: InputMaybe<Scalars['Float']['input']>;
  unitAboveId?: InputMaybe<Scalars['ID']['input']>;
  unitBelowId?: InputMaybe<Scalars['ID']['input']>;
};

export type UpdateHypothesisInput = {
  description?: InputMaybe<Scalars['String']['input']>;
  name?: InputMaybe<Scalars['String']['input']>;
};

export type UpdateSampleInput = {
  ageRelation?: InputMaybe<AgeRelation>;
  c14Age?: InputMaybe<Scalars['Float']['input']>;
  c14Error?: InputMaybe<Scalars['Float']['input']>;
  calendarAgeBp?: InputMaybe<Scalars['Float']['input']>;
  calendarErrorYears?: InputMaybe<Scalars['Float']['input']>;
  curve?: InputMaybe<CurveCode>;
  delta13C?: InputMaybe<Scalars['Float']['input']>;
  deltaR?: InputMaybe<Scalars['Float']['input']>;
  deltaRError?: InputMaybe<Scalars['Float']['input']>;
  /** Name of the regional Delta-R entry (at most 100 characters); empty clears it. */
  deltaRSource?: InputMaybe<Scalars['String']['input']>;
  depthM?: InputMaybe<Scalars['Float']['input']>;
  excluded?: InputMaybe<Scalars['Boolean']['input']>;
  exclusionReason?: InputMaybe<Scalars['String']['input']>;
  /** Scale of the exponential prior on the sample's age offset from its deposit, years (1 to 10,000); null takes the material's default. */
  inheritanceScaleYears?: InputMaybe<Scalars['Float']['input']>;
  labCode?: InputMaybe<Scalars['String']['input']>;
  material?: InputMaybe<SampleMaterial>;
  measurementYear?: InputMaybe<Scalars['Int']['input']>;
  method?: InputMaybe<DatingMethod>;
  notes?: InputMaybe<Scalars['String']['input']>;
  unitId?: InputMaybe<Scalars['ID']['input']>;
};

export type UpdateSegmentInput = {
  /** Down-dip width, km (> 0); null clears it. */
  downDipWidthKm?: InputMaybe<Scalars['Float']['input']>;
  endKm?: InputMaybe<Scalars['Float']['input']>;
  name?: InputMaybe<Scalars['String']['input']>;
  notes?: InputMaybe<Scalars['String']['input']>;
  startKm?: InputMaybe<Scalars['Float']['input']>;
};

export type UpdateSiteInput = {
  alongStrikeKm?: InputMaybe<Scalars['Float']['input']>;
  elevationM?: InputMaybe<Scalars['Float']['input']>;
  kind?: InputMaybe<SiteKind>;
  latitude?: InputMaybe<Scalars['Float']['input']>;
  longitude?: InputMaybe<Scalars['Float']['input']>;
  name?: InputMaybe<Scalars['String']['input']>;
  notes?: InputMaybe<Scalars['String']['input']>;
  segmentId?: InputMaybe<Scalars['ID']['input']>;
  waterDepthM?: InputMaybe<Scalars['Float']['input']>;
};

export type UpdateUnitInput = {
  /** Estimated thickness (m) of mud the unit's base eroded; at least 0; null clears it. */
  basalErosionM?: InputMaybe<Scalars['Float']['input']>;
  baseDepthM?: InputMaybe<Scalars['Float']['input']>;
  facies?: InputMaybe<Facies>;
  name?: InputMaybe<Scalars['String']['input']>;
  notes?: InputMaybe<Scalars['String']['input']>;
  position?: InputMaybe<Scalars['Int']['input']>;
  topDepthM?: InputMaybe<Scalars['Float']['input']>;
};

export type UploadCoreLogInput = {
  /**
   * CSV: a header row "depth (m)" then one "name (unit)" per channel, e.g.
   * "depth (m),magnetic susceptibility (SI 1e-5),density (g/cm3)"; one row per depth, depths in
   * metres below the core top, strictly increasing; an empty cell is no reading. At most 20,000
   * rows and 16 channels. Checked row by row: any problem refuses the sheet (BAD_USER_INPUT on
   * csv with extensions.problems, the first 50 by row, and extensions.problemCount).
   */
  csv: Scalars['String']['input'];
  /** The log's name, unique within the core (e.g. "MSCL 2026"). */
  name: Scalars['String']['input'];
  /** A CORE or LAKE site. */
  siteId: Scalars['ID']['input'];
};

export type User = {
  __typename?: 'User';
  displayName: Scalars['String']['output'];
  email: Scalars['String']['output'];
  id: Scalars['ID']['output'];
  memberships: Array<Membership>;
  /** An operator of this server (OPERATOR_EMAILS): may install the calibration curves every project shares. */
  operator: Scalars['Boolean']['output'];
};

/**
 * Probability of the next event within a window: median and central 95 % range over draws. In a
 * recurrence analysis the headline range carries both dating and renewal-parameter uncertainty; the
 * dating-only range (each age draw's maximum-likelihood fit plugged in) is beside it.
 */
export type WindowProbability = {
  __typename?: 'WindowProbability';
  /** 97.5 % point with dating uncertainty only. */
  datingOnlyHigh95?: Maybe<Scalars['Float']['output']>;
  /** 2.5 % point with dating uncertainty only. */
  datingOnlyLow95?: Maybe<Scalars['Float']['output']>;
  /** Median with dating uncertainty only (plug-in fits); null where not computed (stateless forecast, older analyses). */
  datingOnlyMedian?: Maybe<Scalars['Float']['output']>;
  high95: Scalars['Float']['output'];
  low95: Scalars['Float']['output'];
  median: Scalars['Float']['output'];
  windowYears: Scalars['Float']['output'];
};

export type AgeModelRunQueryVariables = Exact<{
  id: Scalars['ID']['input'];
}>;


export type AgeModelRunQuery = { __typename?: 'Query', ageModelRun: { __typename?: 'AgeModelRun', id: string, status: JobStatus, progress: number, message?: string | null, seed: number, settings: unknown, stale: boolean, createdAt: string, finishedAt?: string | null, depthModel: DepthModel, staleReasons: Array<{ __typename?: 'StaleReason', message: string }>, diagnostics?: { __typename?: 'AgeModelDiagnostics', converged: boolean, maxRhat: number, minEss: number, message: string } | null, events: Array<{ __typename?: 'EventPosterior', medianCalBp: number, meanCalBp: number, rhat?: number | null, ess?: number | null, eventHorizon: { __typename?: 'EventHorizon', id: string, name: string }, hpd68: Array<{ __typename?: 'HpdRange', olderCalBp: number, youngerCalBp: number, probability: number }>, hpd95: Array<{ __typename?: 'HpdRange', olderCalBp: number, youngerCalBp: number, probability: number }>, density: Array<{ __typename?: 'DensityPoint', calBp: number, probability: number }> }>, ageDepth: Array<{ __typename?: 'AgeDepthPoint', depthM: number, eventFreeDepthM: number, medianCalBp: number, low95CalBp: number, high95CalBp: number }>, samples: Array<{ __typename?: 'SamplePosterior', outlierProbability: number, medianCalBp: number, sample: { __typename?: 'Sample', id: string, labCode: string }, hpd95: Array<{ __typename?: 'HpdRange', olderCalBp: number, youngerCalBp: number, probability: number }>, offset?: { __typename?: 'SampleOffsetPosterior', scaleYears: number, medianYears: number, low95Years: number, high95Years: number } | null }>, reservoirOffsets: Array<{ __typename?: 'ReservoirOffsetPosterior', source: string, named: boolean, priorMeanYears: number, priorSdYears: number, medianYears: number, low95Years: number, high95Years: number, samples: Array<{ __typename?: 'Sample', id: string, labCode: string }> }> } };

export type AgeModelSiteQueryVariables = Exact<{
  id: Scalars['ID']['input'];
}>;


export type AgeModelSiteQuery = { __typename?: 'Query', site: { __typename?: 'Site', id: string, name: string, kind: SiteKind, project: { __typename?: 'Project', id: string, name: string, myRole: Role, myPermissions: Array<Permission> }, units: Array<{ __typename?: 'Unit', id: string, position: number, name: string, topDepthM: number, baseDepthM: number, facies: Facies, basalErosionM?: number | null }>, eventHorizons: Array<{ __typename?: 'EventHorizon', id: string, name: string, quality: number, unitBelow: { __typename?: 'Unit', id: string, position: number }, unitAbove: { __typename?: 'Unit', id: string, position: number } }>, samples: Array<{ __typename?: 'Sample', id: string, labCode: string, method: DatingMethod, material: SampleMaterial, ageRelation: AgeRelation, excluded: boolean, depthM?: number | null, calibrationError?: string | null, unit: { __typename?: 'Unit', id: string, position: number }, calibration?: { __typename?: 'Calibration', medianCalBp: number, hpd95: Array<{ __typename?: 'HpdRange', olderCalBp: number, youngerCalBp: number, probability: number }>, densityGrid: { __typename?: 'DensityGrid', startCalBp: number, stepYears: number, values: number[] } } | null }>, latestAgeModelRun?: { __typename?: 'AgeModelRun', id: string, status: JobStatus, stale: boolean } | null, downstreamRun?: { __typename?: 'AgeModelRun', id: string } | null, downstreamRunChoice?: { __typename?: 'DownstreamRunChoice', chosenAt: string, run: { __typename?: 'AgeModelRun', id: string }, chosenBy?: { __typename?: 'User', displayName: string } | null } | null, ageModelRuns: Array<{ __typename?: 'AgeModelRun', id: string, status: JobStatus, progress: number, seed: number, settings: unknown, depthModel: DepthModel, stale: boolean, createdAt: string, finishedAt?: string | null, diagnostics?: { __typename?: 'AgeModelDiagnostics', converged: boolean, maxRhat: number, minEss: number } | null }> } };

export type StartAgeModelRunMutationVariables = Exact<{
  input: StartAgeModelRunInput;
}>;


export type StartAgeModelRunMutation = { __typename?: 'Mutation', startAgeModelRun: { __typename?: 'AgeModelRun', id: string, status: JobStatus } };

export type CancelAgeModelRunMutationVariables = Exact<{
  id: Scalars['ID']['input'];
}>;


export type CancelAgeModelRunMutation = { __typename?: 'Mutation', cancelAgeModelRun: { __typename?: 'AgeModelRun', id: string, status: JobStatus } };

export type ChooseDownstreamRunMutationVariables = Exact<{
  input: ChooseDownstreamRunInput;
}>;


export type ChooseDownstreamRunMutation = { __typename?: 'Mutation', chooseDownstreamRun: { __typename?: 'Site', id: string, downstreamRun?: { __typename?: 'AgeModelRun', id: string } | null } };

export type HpdRangeFieldsFragment = { __typename?: 'HpdRange', olderCalBp: number, youngerCalBp: number, probability: number };

export type SiteAttachmentsQueryVariables = Exact<{
  id: Scalars['ID']['input'];
}>;


export type SiteAttachmentsQuery = { __typename?: 'Query', site: { __typename?: 'Site', id: string, project: { __typename?: 'Project', id: string, myRole: Role, myPermissions: Array<Permission> }, attachments: Array<{ __typename?: 'Attachment', id: string, fileName: string, contentType: string, sizeBytes: number, createdAt: string, url: string, thumbnailUrl?: string | null }>, samples: Array<{ __typename?: 'Sample', id: string, labCode: string, attachments: Array<{ __typename?: 'Attachment', id: string, fileName: string, contentType: string, sizeBytes: number, createdAt: string, url: string, thumbnailUrl?: string | null }> }> } };

export type DeleteAttachmentMutationVariables = Exact<{
  id: Scalars['ID']['input'];
}>;


export type DeleteAttachmentMutation = { __typename?: 'Mutation', deleteAttachment: boolean };

export type AuditTrailQueryVariables = Exact<{
  input: AuditTrailInput;
}>;


export type AuditTrailQuery = { __typename?: 'Query', auditTrail: { __typename?: 'AuditConnection', edges: Array<{ __typename?: 'AuditEdge', cursor: string, node: { __typename?: 'AuditRecord', id: string, at: string, action: string, objectType: string, objectId: string, objectName?: string | null, before?: unknown | null, after?: unknown | null, actor?: { __typename?: 'User', id: string, email: string, displayName: string } | null, referencedNames: Array<{ __typename?: 'NamedId', id: string, name: string }> } }>, pageInfo: { __typename?: 'PageInfo', endCursor?: string | null, hasNextPage: boolean } } };

export type SignInMutationVariables = Exact<{
  email: Scalars['String']['input'];
  password: Scalars['String']['input'];
}>;


export type SignInMutation = { __typename?: 'Mutation', signIn: { __typename?: 'AuthPayload', token: string, user: { __typename?: 'User', id: string, email: string, displayName: string } } };

export type MeQueryVariables = Exact<{ [key: string]: never; }>;


export type MeQuery = { __typename?: 'Query', me: { __typename?: 'User', id: string, email: string, displayName: string } };

export type CalibrateQueryVariables = Exact<{
  input: CalibrateInput;
}>;


export type CalibrateQuery = { __typename?: 'Query', calibrate: { __typename?: 'Calibration', curve?: CurveCode | null, medianCalBp: number, meanCalBp: number, sdYears: number, warnings: Array<string>, hpd68: Array<{ __typename?: 'HpdRange', olderCalBp: number, youngerCalBp: number, probability: number }>, hpd95: Array<{ __typename?: 'HpdRange', olderCalBp: number, youngerCalBp: number, probability: number }>, densityGrid: { __typename?: 'DensityGrid', startCalBp: number, stepYears: number, values: number[] } } };

export type CalibrationCurvesQueryVariables = Exact<{ [key: string]: never; }>;


export type CalibrationCurvesQuery = { __typename?: 'Query', calibrationCurves: Array<{ __typename?: 'CalibrationCurveInfo', code: string, name: string, marine: boolean, builtIn: boolean, youngestCalBp: number, oldestCalBp: number }> };

export type CalibrationCurveBandQueryVariables = Exact<{
  curve: CurveCode;
  youngerCalBp: Scalars['Int']['input'];
  olderCalBp: Scalars['Int']['input'];
}>;


export type CalibrationCurveBandQuery = { __typename?: 'Query', calibrationCurveBand: Array<{ __typename?: 'CurveBandPoint', calBp: number, c14Age: number, c14Sigma: number }> };

export type SiteCalibrationsQueryVariables = Exact<{
  id: Scalars['ID']['input'];
}>;


export type SiteCalibrationsQuery = { __typename?: 'Query', site: { __typename?: 'Site', id: string, samples: Array<{ __typename?: 'Sample', id: string, labCode: string, method: DatingMethod, c14Age?: number | null, c14Error?: number | null, curve?: CurveCode | null, deltaR?: number | null, deltaRError?: number | null, excluded: boolean, unit: { __typename?: 'Unit', id: string, name: string, position: number }, calibration?: { __typename?: 'Calibration', curve?: CurveCode | null, medianCalBp: number, meanCalBp: number, sdYears: number, warnings: Array<string>, hpd68: Array<{ __typename?: 'HpdRange', olderCalBp: number, youngerCalBp: number, probability: number }>, hpd95: Array<{ __typename?: 'HpdRange', olderCalBp: number, youngerCalBp: number, probability: number }>, densityGrid: { __typename?: 'DensityGrid', startCalBp: number, stepYears: number, values: number[] } } | null }> } };

export type SiteCoreLogsQueryVariables = Exact<{
  id: Scalars['ID']['input'];
}>;


export type SiteCoreLogsQuery = { __typename?: 'Query', site: { __typename?: 'Site', id: string, name: string, units: Array<{ __typename?: 'Unit', id: string, position: number, name: string, topDepthM: number, baseDepthM: number, facies: Facies, basalErosionM?: number | null }>, eventHorizons: Array<{ __typename?: 'EventHorizon', id: string, name: string, unitAbove: { __typename?: 'Unit', id: string } }>, samples: Array<{ __typename?: 'Sample', id: string, labCode: string, depthM?: number | null, excluded: boolean, calibration?: { __typename?: 'Calibration', medianCalBp: number, hpd95: Array<{ __typename?: 'HpdRange', olderCalBp: number, youngerCalBp: number }> } | null }>, coreLogs: Array<{ __typename?: 'CoreLog', id: string, name: string, channels: Array<string>, units: Array<string>, topDepthM: number, baseDepthM: number, rowCount: number, traces: Array<{ __typename?: 'CoreLogTrace', channel: string, unit: string, depthsM: Array<number>, values: Array<number> }> }> } };

export type UploadCoreLogMutationVariables = Exact<{
  input: UploadCoreLogInput;
}>;


export type UploadCoreLogMutation = { __typename?: 'Mutation', uploadCoreLog: { __typename?: 'CoreLog', id: string, channels: Array<string> } };

export type DeleteCoreLogMutationVariables = Exact<{
  id: Scalars['ID']['input'];
}>;


export type DeleteCoreLogMutation = { __typename?: 'Mutation', deleteCoreLog: boolean };

export type JointRunQueryVariables = Exact<{
  id: Scalars['ID']['input'];
}>;


export type JointRunQuery = { __typename?: 'Query', jointAgeModelRun: { __typename?: 'JointAgeModelRun', id: string, status: JobStatus, progress: number, message?: string | null, seed: number, hypothesisVersion: number, createdAt: string, finishedAt?: string | null, stale: boolean, staleReasons: Array<{ __typename?: 'StaleReason', message: string }>, chains: Array<{ __typename?: 'JointAgeModelChain', index: number, status: JobStatus, progress: number, message?: string | null }>, depthModels: Array<{ __typename?: 'JointSiteDepthModel', siteId: string, siteName: string, depthModel: DepthModel }>, diagnostics?: { __typename?: 'AgeModelDiagnostics', converged: boolean, maxRhat: number, minEss: number, message: string } | null, regionalEvents: Array<{ __typename?: 'JointRegionalEventPosterior', id: string, medianCalBp: number, rhat: number, ess: number, members: Array<{ __typename?: 'EventHorizon', id: string, name: string }>, hpd95: Array<{ __typename?: 'HpdRange', olderCalBp: number, youngerCalBp: number, probability: number }> }> } };

export type StartJointAgeModelRunMutationVariables = Exact<{
  input: StartJointAgeModelRunInput;
}>;


export type StartJointAgeModelRunMutation = { __typename?: 'Mutation', startJointAgeModelRun: { __typename?: 'JointAgeModelRun', id: string, status: JobStatus } };

export type CancelJointAgeModelRunMutationVariables = Exact<{
  id: Scalars['ID']['input'];
}>;


export type CancelJointAgeModelRunMutation = { __typename?: 'Mutation', cancelJointAgeModelRun: { __typename?: 'JointAgeModelRun', id: string, status: JobStatus } };

export type EventLadderQueryVariables = Exact<{
  projectId: Scalars['ID']['input'];
}>;


export type EventLadderQuery = { __typename?: 'Query', eventLadder: { __typename?: 'EventLadder', columns: Array<{ __typename?: 'LadderColumn', site: { __typename?: 'Site', id: string, name: string, kind: SiteKind, alongStrikeKm: number, segment?: { __typename?: 'Segment', id: string, name: string } | null }, latestAgeModelRun?: { __typename?: 'AgeModelRun', id: string, stale: boolean } | null, events: Array<{ __typename?: 'LadderEvent', medianCalBp?: number | null, eventHorizon: { __typename?: 'EventHorizon', id: string, name: string, quality: number }, hpd95: Array<{ __typename?: 'HpdRange', olderCalBp: number, youngerCalBp: number, probability: number }>, densityGrid?: { __typename?: 'DensityGrid', startCalBp: number, stepYears: number, values: number[] } | null }> }> }, project: { __typename?: 'Project', id: string, name: string, myRole: Role, myPermissions: Array<Permission>, tectonicSetting: TectonicSetting, segments: Array<{ __typename?: 'Segment', id: string, name: string, startKm: number, endKm: number }>, hypotheses: Array<{ __typename?: 'Hypothesis', id: string, name: string, preferred: boolean, version: number }> } };

export type HypothesisQueryVariables = Exact<{
  id: Scalars['ID']['input'];
}>;


export type HypothesisQuery = { __typename?: 'Query', hypothesis: { __typename?: 'Hypothesis', id: string, name: string, description?: string | null, preferred: boolean, version: number, author?: { __typename?: 'User', id: string, displayName: string } | null, copiedFrom?: { __typename?: 'Hypothesis', id: string, name: string } | null, ties: Array<{ __typename?: 'Tie', id: string, confidence: number, evidence: Array<string>, note?: string | null, eventA: { __typename?: 'EventHorizon', id: string, name: string }, eventB: { __typename?: 'EventHorizon', id: string, name: string } }>, latestJointRun?: { __typename?: 'JointAgeModelRun', id: string, status: JobStatus } | null, regionalEvents: Array<{ __typename?: 'RegionalEvent', id: string, combinedMedianCalBp?: number | null, jointMedianCalBp?: number | null, ageShown: RegionalEventAgeSource, concordance?: number | null, concordanceThreshold?: number | null, concordanceLow: boolean, warnings: Array<string>, ruptureLengthKm?: number | null, jointHpd95: Array<{ __typename?: 'HpdRange', olderCalBp: number, youngerCalBp: number, probability: number }>, members: Array<{ __typename?: 'EventHorizon', id: string, name: string }>, combinedHpd95: Array<{ __typename?: 'HpdRange', olderCalBp: number, youngerCalBp: number, probability: number }>, chiSquare?: { __typename?: 'ChiSquareTest', t: number, df: number, critical5: number, passes: boolean } | null, magnitude?: { __typename?: 'MagnitudeEstimate', mw: number, sigma: number, relation: string } | null, magnitudeFromArea?: { __typename?: 'MagnitudeEstimate', mw: number, sigma: number, relation: string } | null, magnitudeFromDisplacement?: { __typename?: 'MagnitudeEstimate', mw: number, sigma: number, relation: string } | null, ageModelRuns: Array<{ __typename?: 'AgeModelRun', id: string, seed: number, stale: boolean, site: { __typename?: 'Site', id: string, name: string } }> }>, orderConflicts: Array<{ __typename?: 'OrderConflict', message: string, regionalEventIds: Array<string>, tieA: { __typename?: 'Tie', id: string }, tieB: { __typename?: 'Tie', id: string }, ties: Array<{ __typename?: 'Tie', id: string, eventA: { __typename?: 'EventHorizon', id: string }, eventB: { __typename?: 'EventHorizon', id: string } }>, steps: Array<{ __typename?: 'OrderStep', site: { __typename?: 'Site', id: string }, older: { __typename?: 'EventHorizon', id: string }, younger: { __typename?: 'EventHorizon', id: string } }> }> } };

export type AddTieMutationVariables = Exact<{
  input: AddTieInput;
}>;


export type AddTieMutation = { __typename?: 'Mutation', addTie: { __typename?: 'Tie', id: string } };

export type RemoveTieMutationVariables = Exact<{
  id: Scalars['ID']['input'];
}>;


export type RemoveTieMutation = { __typename?: 'Mutation', removeTie: boolean };

export type CreateHypothesisMutationVariables = Exact<{
  input: CreateHypothesisInput;
}>;


export type CreateHypothesisMutation = { __typename?: 'Mutation', createHypothesis: { __typename?: 'Hypothesis', id: string, name: string } };

export type SetPreferredHypothesisMutationVariables = Exact<{
  id: Scalars['ID']['input'];
}>;


export type SetPreferredHypothesisMutation = { __typename?: 'Mutation', setPreferredHypothesis: { __typename?: 'Hypothesis', id: string, preferred: boolean } };

export type HypothesisSizeProfilesQueryVariables = Exact<{
  id: Scalars['ID']['input'];
}>;


export type HypothesisSizeProfilesQuery = { __typename?: 'Query', hypothesis: { __typename?: 'Hypothesis', id: string, regionalEvents: Array<{ __typename?: 'RegionalEvent', id: string, combinedMedianCalBp?: number | null, members: Array<{ __typename?: 'EventHorizon', id: string, name: string }>, sizeProfile: Array<{ __typename?: 'SizeEvidencePoint', alongStrikeKm?: number | null, subsidenceM?: number | null, subsidenceErrorM?: number | null, displacementM?: number | null, displacementErrorM?: number | null, bedThicknessM?: number | null, eventHorizon: { __typename?: 'EventHorizon', id: string, name: string }, site: { __typename?: 'Site', id: string, name: string } }> }> } };

export type LadderCoreLogsQueryVariables = Exact<{
  id: Scalars['ID']['input'];
}>;


export type LadderCoreLogsQuery = { __typename?: 'Query', site: { __typename?: 'Site', id: string, units: Array<{ __typename?: 'Unit', id: string, position: number, name: string, topDepthM: number, baseDepthM: number, facies: Facies }>, eventHorizons: Array<{ __typename?: 'EventHorizon', id: string, unitAbove: { __typename?: 'Unit', id: string } }>, coreLogs: Array<{ __typename?: 'CoreLog', id: string, name: string, channels: Array<string>, units: Array<string>, traces: Array<{ __typename?: 'CoreLogTrace', channel: string, unit: string, depthsM: Array<number>, values: Array<number> }> }> } };

export type TieSuggestionsQueryVariables = Exact<{
  input: TieSuggestionsInput;
}>;


export type TieSuggestionsQuery = { __typename?: 'Query', tieSuggestions: Array<{ __typename?: 'TieSuggestion', score: number, tied: boolean, channels: Array<string>, eventA: { __typename?: 'EventHorizon', id: string, name: string }, eventB: { __typename?: 'EventHorizon', id: string, name: string } }> };

export type ImportSamplesMutationVariables = Exact<{
  input: ImportSamplesInput;
}>;


export type ImportSamplesMutation = { __typename?: 'Mutation', importSamples: { __typename?: 'ImportResult', rowCount: number, committed: boolean, errors: Array<{ __typename?: 'ImportRowError', row: number, scope: ImportProblemScope, field: string, message: string }>, columns: Array<{ __typename?: 'ImportColumn', header: string, field?: string | null, source: ImportColumnSource }>, preview: Array<{ __typename?: 'ImportPreviewRow', row: number, labCode: string, unitName: string, medianCalBp?: number | null, warnings: Array<string>, hpd95: Array<{ __typename?: 'HpdRange', olderCalBp: number, youngerCalBp: number, probability: number }> }> } };

export type ProjectsQueryVariables = Exact<{ [key: string]: never; }>;


export type ProjectsQuery = { __typename?: 'Query', projects: Array<{ __typename?: 'Project', id: string, name: string, description?: string | null, tectonicSetting: TectonicSetting, myRole: Role, myPermissions: Array<Permission> }> };

export type ProjectOverviewQueryVariables = Exact<{
  id: Scalars['ID']['input'];
}>;


export type ProjectOverviewQuery = { __typename?: 'Query', project: { __typename?: 'Project', id: string, name: string, description?: string | null, tectonicSetting: TectonicSetting, myRole: Role, myPermissions: Array<Permission>, segments: Array<{ __typename?: 'Segment', id: string, version: number, name: string, startKm: number, endKm: number, notes?: string | null, downDipWidthKm?: number | null }>, sites: Array<{ __typename?: 'Site', id: string, version: number, name: string, kind: SiteKind, latitude: number, longitude: number, alongStrikeKm: number, elevationM?: number | null, waterDepthM?: number | null, notes?: string | null, segment?: { __typename?: 'Segment', id: string, name: string } | null, eventHorizons: Array<{ __typename?: 'EventHorizon', id: string }>, samples: Array<{ __typename?: 'Sample', id: string }> }> } };

export type CreateSegmentMutationVariables = Exact<{
  input: CreateSegmentInput;
}>;


export type CreateSegmentMutation = { __typename?: 'Mutation', createSegment: { __typename?: 'Segment', id: string } };

export type UpdateSegmentMutationVariables = Exact<{
  id: Scalars['ID']['input'];
  version: Scalars['Int']['input'];
  input: UpdateSegmentInput;
}>;


export type UpdateSegmentMutation = { __typename?: 'Mutation', updateSegment: { __typename?: 'Segment', id: string, version: number } };

export type DeleteSegmentMutationVariables = Exact<{
  id: Scalars['ID']['input'];
}>;


export type DeleteSegmentMutation = { __typename?: 'Mutation', deleteSegment: boolean };

export type CreateSiteMutationVariables = Exact<{
  input: CreateSiteInput;
}>;


export type CreateSiteMutation = { __typename?: 'Mutation', createSite: { __typename?: 'Site', id: string } };

export type UpdateSiteMutationVariables = Exact<{
  id: Scalars['ID']['input'];
  version: Scalars['Int']['input'];
  input: UpdateSiteInput;
}>;


export type UpdateSiteMutation = { __typename?: 'Mutation', updateSite: { __typename?: 'Site', id: string, version: number } };

export type DeleteSiteMutationVariables = Exact<{
  id: Scalars['ID']['input'];
}>;


export type DeleteSiteMutation = { __typename?: 'Mutation', deleteSite: boolean };

export type SegmentEventTableFieldsFragment = { __typename?: 'SegmentEventTable', segmentId: string, segmentName: string, segmentStartKm: number, segmentEndKm: number, hypothesisId: string, hypothesisName: string, hypothesisVersion: number, countedEvents: number, expectedEvents: number, weighted: boolean, note: string, rule: { __typename?: 'CountingRule', minimumSpanShare: number, includeUntied: boolean, qualityWeights?: Array<number> | null, confidenceWeights?: Array<number> | null }, rows: Array<{ __typename?: 'SegmentEventTableRow', regionalEventId: string, label: string, segmentNames: Array<string>, spanShare: number, throughGoing: boolean, untied: boolean, tieConfidences: Array<number>, qualities: Array<number>, medianCalBp?: number | null, counted: boolean, inclusionProbability: number, reason: string, members: Array<{ __typename?: 'SegmentEventTableMember', eventHorizonId: string, eventName: string, siteId: string, siteName: string, alongStrikeKm: number, segmentName?: string | null, quality: number }> }> };

export type SegmentEventTableQueryVariables = Exact<{
  input: SegmentEventTableInput;
}>;


export type SegmentEventTableQuery = { __typename?: 'Query', segmentEventTable: { __typename?: 'SegmentEventTable', segmentId: string, segmentName: string, segmentStartKm: number, segmentEndKm: number, hypothesisId: string, hypothesisName: string, hypothesisVersion: number, countedEvents: number, expectedEvents: number, weighted: boolean, note: string, rule: { __typename?: 'CountingRule', minimumSpanShare: number, includeUntied: boolean, qualityWeights?: Array<number> | null, confidenceWeights?: Array<number> | null }, rows: Array<{ __typename?: 'SegmentEventTableRow', regionalEventId: string, label: string, segmentNames: Array<string>, spanShare: number, throughGoing: boolean, untied: boolean, tieConfidences: Array<number>, qualities: Array<number>, medianCalBp?: number | null, counted: boolean, inclusionProbability: number, reason: string, members: Array<{ __typename?: 'SegmentEventTableMember', eventHorizonId: string, eventName: string, siteId: string, siteName: string, alongStrikeKm: number, segmentName?: string | null, quality: number }> }> } };

export type AnalysisEventTableQueryVariables = Exact<{
  id: Scalars['ID']['input'];
}>;


export type AnalysisEventTableQuery = { __typename?: 'Query', recurrenceAnalysis: { __typename?: 'RecurrenceAnalysis', id: string, recordEvents?: { __typename?: 'RangeEstimate', median: number, low95: number, high95: number } | null, intervals: Array<{ __typename?: 'IntervalEstimate', index: number, shareOfDraws?: number | null }>, eventTable?: { __typename?: 'SegmentEventTable', segmentId: string, segmentName: string, segmentStartKm: number, segmentEndKm: number, hypothesisId: string, hypothesisName: string, hypothesisVersion: number, countedEvents: number, expectedEvents: number, weighted: boolean, note: string, rule: { __typename?: 'CountingRule', minimumSpanShare: number, includeUntied: boolean, qualityWeights?: Array<number> | null, confidenceWeights?: Array<number> | null }, rows: Array<{ __typename?: 'SegmentEventTableRow', regionalEventId: string, label: string, segmentNames: Array<string>, spanShare: number, throughGoing: boolean, untied: boolean, tieConfidences: Array<number>, qualities: Array<number>, medianCalBp?: number | null, counted: boolean, inclusionProbability: number, reason: string, members: Array<{ __typename?: 'SegmentEventTableMember', eventHorizonId: string, eventName: string, siteId: string, siteName: string, alongStrikeKm: number, segmentName?: string | null, quality: number }> }> } | null } };

export type RecurrenceComparisonQueryVariables = Exact<{
  analysisAId: Scalars['ID']['input'];
  analysisBId: Scalars['ID']['input'];
}>;


export type RecurrenceComparisonQuery = { __typename?: 'Query', recurrenceComparison: { __typename?: 'RecurrenceComparison', settingDifferences: Array<string>, note: string, caution: string, analysisA: { __typename?: 'RecurrenceAnalysis', id: string, hypothesisVersion?: number | null, hypothesis?: { __typename?: 'Hypothesis', id: string, name: string } | null }, analysisB: { __typename?: 'RecurrenceAnalysis', id: string, hypothesisVersion?: number | null, hypothesis?: { __typename?: 'Hypothesis', id: string, name: string } | null }, events: Array<{ __typename?: 'ComparedEventRow', regionalEventId: string, label: string, difference: EventDifference, a?: { __typename?: 'ComparedEventSide', counted: boolean, inclusionProbability: number, spanShare: number, throughGoing: boolean, untied: boolean, medianCalBp?: number | null, reason: string } | null, b?: { __typename?: 'ComparedEventSide', counted: boolean, inclusionProbability: number, spanShare: number, throughGoing: boolean, untied: boolean, medianCalBp?: number | null, reason: string } | null }>, statistics: Array<{ __typename?: 'ComparedStatistic', quantity: string, unit: string, medianDifference: number, rangesOverlap: boolean, a: { __typename?: 'RangeEstimate', median: number, low95: number, high95: number }, b: { __typename?: 'RangeEstimate', median: number, low95: number, high95: number } }>, probabilities: Array<{ __typename?: 'ComparedProbability', model: string, windowYears: number, medianDifference: number, rangesOverlap: boolean, a: { __typename?: 'WindowProbability', median: number, low95: number, high95: number }, b: { __typename?: 'WindowProbability', median: number, low95: number, high95: number } }> } };

export type RecurrenceSetupQueryVariables = Exact<{
  projectId: Scalars['ID']['input'];
}>;


export type RecurrenceSetupQuery = { __typename?: 'Query', project: { __typename?: 'Project', id: string, name: string, myRole: Role, myPermissions: Array<Permission>, segments: Array<{ __typename?: 'Segment', id: string, name: string }>, sites: Array<{ __typename?: 'Site', id: string, name: string, kind: SiteKind }>, hypotheses: Array<{ __typename?: 'Hypothesis', id: string, name: string, preferred: boolean }>, preferredHypothesis?: { __typename?: 'Hypothesis', id: string } | null, recurrenceAnalyses: Array<{ __typename?: 'RecurrenceAnalysis', id: string, status: JobStatus, createdAt: string, forecastStartYear: number, draws: number, segment?: { __typename?: 'Segment', id: string, name: string } | null, site?: { __typename?: 'Site', id: string, name: string } | null, hypothesis?: { __typename?: 'Hypothesis', id: string, name: string } | null }> } };

export type RecurrenceAnalysisQueryVariables = Exact<{
  id: Scalars['ID']['input'];
}>;


export type RecurrenceAnalysisQuery = { __typename?: 'Query', recurrenceAnalysis: { __typename?: 'RecurrenceAnalysis', id: string, status: JobStatus, progress: number, message?: string | null, seed: number, forecastStartYear: number, windowsYears: Array<number>, draws: number, createdAt: string, finishedAt?: string | null, hypothesisVersion?: number | null, stale: boolean, eventCount?: number | null, lastEventMedianCalBp?: number | null, parameterNote?: string | null, modelComparisonNote?: string | null, caution: string, staleReasons: Array<{ __typename?: 'StaleReason', message: string, via: Array<string> }>, inputs: { __typename?: 'RecurrenceInputs', hypothesisVersion?: number | null, ageModelRuns: Array<{ __typename?: 'AgeModelRun', id: string, site: { __typename?: 'Site', id: string, name: string } }> }, segment?: { __typename?: 'Segment', id: string, name: string } | null, site?: { __typename?: 'Site', id: string, name: string } | null, hypothesis?: { __typename?: 'Hypothesis', id: string, name: string } | null, openInterval?: { __typename?: 'RangeEstimate', median: number, low95: number, high95: number } | null, intervals: Array<{ __typename?: 'IntervalEstimate', index: number, medianYears: number, low95: number, high95: number, youngerEvent?: string | null, olderEvent?: string | null }>, meanRecurrence?: { __typename?: 'RangeEstimate', median: number, low95: number, high95: number } | null, medianRecurrence?: { __typename?: 'RangeEstimate', median: number, low95: number, high95: number } | null, sdRecurrence?: { __typename?: 'RangeEstimate', median: number, low95: number, high95: number } | null, aperiodicity?: { __typename?: 'RangeEstimate', median: number, low95: number, high95: number } | null, poisson: Array<{ __typename?: 'WindowProbability', windowYears: number, median: number, low95: number, high95: number }>, models: Array<{ __typename?: 'ModelResult', model: RenewalModel, aic: number, deltaAic: number, aicc?: number | null, deltaAicc?: number | null, akaikeWeight: number, meanRecurrenceYears: number, aperiodicity: number, logLikelihood: number, meanRecurrenceRange?: { __typename?: 'ParameterRange', median: number, low95: number, high95: number, datingOnlyLow95?: number | null, datingOnlyHigh95?: number | null } | null, aperiodicityRange?: { __typename?: 'ParameterRange', median: number, low95: number, high95: number, datingOnlyLow95?: number | null, datingOnlyHigh95?: number | null } | null, probabilities: Array<{ __typename?: 'WindowProbability', windowYears: number, median: number, low95: number, high95: number, datingOnlyLow95?: number | null, datingOnlyHigh95?: number | null }> }>, modelAveraged: Array<{ __typename?: 'WindowProbability', windowYears: number, median: number, low95: number, high95: number, datingOnlyLow95?: number | null, datingOnlyHigh95?: number | null }>, curves: Array<{ __typename?: 'ModelCurves', model: RenewalModel, density: Array<{ __typename?: 'CurvePoint', years: number, value: number }>, hazard: Array<{ __typename?: 'CurvePoint', years: number, value: number }>, survival: Array<{ __typename?: 'CurvePoint', years: number, value: number }> }>, histogram: Array<{ __typename?: 'HistogramBin', fromYears: number, toYears: number, count: number }> } };

export type StartRecurrenceAnalysisMutationVariables = Exact<{
  input: StartRecurrenceAnalysisInput;
}>;


export type StartRecurrenceAnalysisMutation = { __typename?: 'Mutation', startRecurrenceAnalysis: { __typename?: 'RecurrenceAnalysis', id: string, status: JobStatus } };

export type CancelRecurrenceAnalysisMutationVariables = Exact<{
  id: Scalars['ID']['input'];
}>;


export type CancelRecurrenceAnalysisMutation = { __typename?: 'Mutation', cancelRecurrenceAnalysis: { __typename?: 'RecurrenceAnalysis', id: string, status: JobStatus } };

export type RefreshStaleResultsMutationVariables = Exact<{
  projectId: Scalars['ID']['input'];
}>;


export type RefreshStaleResultsMutation = { __typename?: 'Mutation', refreshStaleResults: { __typename?: 'RefreshPlan', id: string } };

export type LatestRefreshQueryVariables = Exact<{
  projectId: Scalars['ID']['input'];
}>;


export type LatestRefreshQuery = { __typename?: 'Query', project: { __typename?: 'Project', id: string, refreshSettings: { __typename?: 'RefreshSettings', automatic: boolean, debounceSeconds: number }, downstreamRunChoices: Array<{ __typename?: 'DownstreamRunChoice', newerRunExists: boolean, site: { __typename?: 'Site', id: string, name: string }, run: { __typename?: 'AgeModelRun', id: string, createdAt: string }, newestRun: { __typename?: 'AgeModelRun', id: string, createdAt: string } }>, refreshPlans: Array<{ __typename?: 'RefreshPlan', id: string, status: string, automatic: boolean, createdAt: string, steps: Array<{ __typename?: 'RefreshStep', id: string, stage: number, kind: string, label: string, status: string, message?: string | null, freshId?: string | null, waitingFor: Array<string> }>, ageModelRuns: Array<{ __typename?: 'AgeModelRun', id: string, site: { __typename?: 'Site', id: string } }>, skipped: Array<{ __typename?: 'SkippedRefresh', id: string, kind: string, label: string, reason: string }>, progress: { __typename?: 'RefreshProgress', total: number, waiting: number, running: number, succeeded: number, failed: number, blocked: number, skipped: number, fraction: number } }> } };

export type SetRefreshSettingsMutationVariables = Exact<{
  input: SetRefreshSettingsInput;
}>;


export type SetRefreshSettingsMutation = { __typename?: 'Mutation', setRefreshSettings: { __typename?: 'RefreshSettings', automatic: boolean, debounceSeconds: number } };

export type ProjectReleasesQueryVariables = Exact<{
  id: Scalars['ID']['input'];
}>;


export type ProjectReleasesQuery = { __typename?: 'Query', project: { __typename?: 'Project', id: string, myRole: Role, myPermissions: Array<Permission>, releases: Array<{ __typename?: 'Release', id: string, number: number, note: string, createdAt: string, createdBy: { __typename?: 'User', id: string, displayName: string, email: string } }> } };

export type ReleaseQueryVariables = Exact<{
  id: Scalars['ID']['input'];
}>;


export type ReleaseQuery = { __typename?: 'Query', release: { __typename?: 'Release', id: string, number: number, note: string, createdAt: string, createdBy: { __typename?: 'User', id: string, displayName: string }, segments: Array<{ __typename?: 'ReleasedSegment', id: string, name: string, startKm: number, endKm: number }>, sites: Array<{ __typename?: 'ReleasedSite', id: string, name: string, kind: SiteKind, latitude: number, longitude: number, alongStrikeKm: number, segment?: { __typename?: 'ReleasedSegment', id: string, name: string } | null, units: Array<{ __typename?: 'ReleasedUnit', id: string }>, eventHorizons: Array<{ __typename?: 'ReleasedEventHorizon', id: string }>, samples: Array<{ __typename?: 'ReleasedSample', id: string }> }> } };

export type ReleaseDiffQueryVariables = Exact<{
  fromId: Scalars['ID']['input'];
  toId: Scalars['ID']['input'];
}>;


export type ReleaseDiffQuery = { __typename?: 'Query', releaseDiff: { __typename?: 'ReleaseDiff', from: { __typename?: 'Release', id: string, number: number }, to: { __typename?: 'Release', id: string, number: number }, changes: Array<{ __typename?: 'ReleaseChange', objectType: string, objectId: string, label: string, change: string }> } };

export type CreateReleaseMutationVariables = Exact<{
  input: CreateReleaseInput;
}>;


export type CreateReleaseMutation = { __typename?: 'Mutation', createRelease: { __typename?: 'Release', id: string, number: number } };

export type CreateSampleMutationVariables = Exact<{
  input: CreateSampleInput;
}>;


export type CreateSampleMutation = { __typename?: 'Mutation', createSample: { __typename?: 'Sample', id: string } };

export type UpdateSampleMutationVariables = Exact<{
  id: Scalars['ID']['input'];
  version: Scalars['Int']['input'];
  input: UpdateSampleInput;
}>;


export type UpdateSampleMutation = { __typename?: 'Mutation', updateSample: { __typename?: 'Sample', id: string, version: number } };

export type DeleteSampleMutationVariables = Exact<{
  id: Scalars['ID']['input'];
}>;


export type DeleteSampleMutation = { __typename?: 'Mutation', deleteSample: boolean };

export type SiteQueryVariables = Exact<{
  id: Scalars['ID']['input'];
}>;


export type SiteQuery = { __typename?: 'Query', site: { __typename?: 'Site', id: string, version: number, name: string, kind: SiteKind, latitude: number, longitude: number, alongStrikeKm: number, elevationM?: number | null, waterDepthM?: number | null, notes?: string | null, project: { __typename?: 'Project', id: string, name: string, myRole: Role, myPermissions: Array<Permission> }, segment?: { __typename?: 'Segment', id: string, name: string } | null, units: Array<{ __typename?: 'Unit', id: string, version: number, position: number, name: string, topDepthM: number, baseDepthM: number, facies: Facies, basalErosionM?: number | null, notes?: string | null }>, eventHorizons: Array<{ __typename?: 'EventHorizon', id: string, version: number, name: string, quality: number, evidence: Array<string>, notes?: string | null, subsidenceM?: number | null, subsidenceErrorM?: number | null, displacementM?: number | null, displacementErrorM?: number | null, bedThicknessM?: number | null, unitBelow: { __typename?: 'Unit', id: string }, unitAbove: { __typename?: 'Unit', id: string } }>, samples: Array<{ __typename?: 'Sample', id: string, version: number, labCode: string, method: DatingMethod, material: SampleMaterial, depthM?: number | null, ageRelation: AgeRelation, c14Age?: number | null, c14Error?: number | null, delta13C?: number | null, curve?: CurveCode | null, deltaR?: number | null, deltaRError?: number | null, deltaRSource?: string | null, inheritanceScaleYears?: number | null, inheritanceScaleDefaultYears: number, calendarAgeBp?: number | null, calendarErrorYears?: number | null, measurementYear?: number | null, excluded: boolean, exclusionReason?: string | null, notes?: string | null, calibrationError?: string | null, unit: { __typename?: 'Unit', id: string }, calibration?: { __typename?: 'Calibration', curve?: CurveCode | null, medianCalBp: number, meanCalBp: number, sdYears: number, warnings: Array<string>, hpd68: Array<{ __typename?: 'HpdRange', olderCalBp: number, youngerCalBp: number, probability: number }>, hpd95: Array<{ __typename?: 'HpdRange', olderCalBp: number, youngerCalBp: number, probability: number }> } | null }> } };

export type CreateUnitMutationVariables = Exact<{
  input: CreateUnitInput;
}>;


export type CreateUnitMutation = { __typename?: 'Mutation', createUnit: { __typename?: 'Unit', id: string } };

export type UpdateUnitMutationVariables = Exact<{
  id: Scalars['ID']['input'];
  version: Scalars['Int']['input'];
  input: UpdateUnitInput;
}>;


export type UpdateUnitMutation = { __typename?: 'Mutation', updateUnit: { __typename?: 'Unit', id: string, version: number } };

export type DeleteUnitMutationVariables = Exact<{
  id: Scalars['ID']['input'];
}>;


export type DeleteUnitMutation = { __typename?: 'Mutation', deleteUnit: boolean };

export type CreateEventHorizonMutationVariables = Exact<{
  input: CreateEventHorizonInput;
}>;


export type CreateEventHorizonMutation = { __typename?: 'Mutation', createEventHorizon: { __typename?: 'EventHorizon', id: string } };

export type UpdateEventHorizonMutationVariables = Exact<{
  id: Scalars['ID']['input'];
  version: Scalars['Int']['input'];
  input: UpdateEventHorizonInput;
}>;


export type UpdateEventHorizonMutation = { __typename?: 'Mutation', updateEventHorizon: { __typename?: 'EventHorizon', id: string, version: number } };

export type DeleteEventHorizonMutationVariables = Exact<{
  id: Scalars['ID']['input'];
}>;


export type DeleteEventHorizonMutation = { __typename?: 'Mutation', deleteEventHorizon: boolean };

export type AcceptInvitationMutationVariables = Exact<{
  input: AcceptInvitationInput;
}>;


export type AcceptInvitationMutation = { __typename?: 'Mutation', acceptInvitation: { __typename?: 'AuthPayload', token: string, user: { __typename?: 'User', id: string, email: string, displayName: string } } };

export type RequestPasswordResetMutationVariables = Exact<{
  email: Scalars['String']['input'];
}>;


export type RequestPasswordResetMutation = { __typename?: 'Mutation', requestPasswordReset: boolean };

export type ResetPasswordMutationVariables = Exact<{
  input: ResetPasswordInput;
}>;


export type ResetPasswordMutation = { __typename?: 'Mutation', resetPassword: boolean };

export type ProjectTeamQueryVariables = Exact<{
  id: Scalars['ID']['input'];
}>;


export type ProjectTeamQuery = { __typename?: 'Query', project: { __typename?: 'Project', id: string, name: string, myRole: Role, myPermissions: Array<Permission>, members: Array<{ __typename?: 'Membership', id: string, role: Role, user: { __typename?: 'User', id: string, email: string, displayName: string } }>, invitations: Array<{ __typename?: 'Invitation', id: string, email: string, role: Role, expiresAt: string, acceptedAt?: string | null }> } };

export type InviteMemberMutationVariables = Exact<{
  input: InviteMemberInput;
}>;


export type InviteMemberMutation = { __typename?: 'Mutation', inviteMember: { __typename?: 'Invitation', id: string, email: string, role: Role, expiresAt: string } };

export type SetMemberRoleMutationVariables = Exact<{
  input: SetMemberRoleInput;
}>;


export type SetMemberRoleMutation = { __typename?: 'Mutation', setMemberRole: { __typename?: 'Membership', id: string, role: Role } };

export type RemoveMemberMutationVariables = Exact<{
  projectId: Scalars['ID']['input'];
  userId: Scalars['ID']['input'];
}>;


export type RemoveMemberMutation = { __typename?: 'Mutation', removeMember: boolean };

export type InvitationLinkQueryVariables = Exact<{
  token: Scalars['String']['input'];
}>;


export type InvitationLinkQuery = { __typename?: 'Query', invitationLink: { __typename?: 'InvitationLink', status: InvitationLinkStatus, projectName?: string | null } };

export class TypedDocumentString<TResult, TVariables>
  extends String
  implements DocumentTypeDecoration<TResult, TVariables>
{
  __apiType?: NonNullable<DocumentTypeDecoration<TResult, TVariables>['__apiType']>;
  private value: string;
  public __meta__?: Record<string, any> | undefined;

  constructor(value: string, __meta__?: Record<string, any> | undefined) {
    super(value);
    this.value = value;
    this.__meta__ = __meta__;
  }

  override toString(): string & DocumentTypeDecoration<TResult, TVariables> {
    return this.value;
  }
}
export const HpdRangeFieldsFragmentDoc = new TypedDocumentString(`
    fragment HpdRangeFields on HpdRange {
  olderCalBp
  youngerCalBp
  probability
}
    `, {"fragmentName":"HpdRangeFields"}) as unknown as TypedDocumentString<HpdRangeFieldsFragment, unknown>;
export const SegmentEventTableFieldsFragmentDoc = new TypedDocumentString(`
    fragment SegmentEventTableFields on SegmentEventTable {
  segmentId
  segmentName
  segmentStartKm
  segmentEndKm
  hypothesisId
  hypothesisName
  hypothesisVersion
  rule {
    minimumSpanShare
    includeUntied
    qualityWeights
    confidenceWeights
  }
  rows {
    regionalEventId
    label
    members {
      eventHorizonId
      eventName
      siteId
      siteName
      alongStrikeKm
      segmentName
      quality
    }
    segmentNames
    spanShare
    throughGoing
    untied
    tieConfidences
    qualities
    medianCalBp
    counted
    inclusionProbability
    reason
  }
  countedEvents
  expectedEvents
  weighted
  note
}
    `, {"fragmentName":"SegmentEventTableFields"}) as unknown as TypedDocumentString<SegmentEventTableFieldsFragment, unknown>;
export const AgeModelRunDocument = new TypedDocumentString(`
    query AgeModelRun($id: ID!) {
  ageModelRun(id: $id) {
    id
    status
    progress
    message
    seed
    settings
    stale
    staleReasons {
      message
    }
    createdAt
    finishedAt
    diagnostics {
      converged
      maxRhat
      minEss
      message
    }
    events {
      medianCalBp
      meanCalBp
      rhat
      ess
      eventHorizon {
        id
        name
      }
      hpd68 {
        ...HpdRangeFields
      }
      hpd95 {
        ...HpdRangeFields
      }
      density {
        calBp
        probability
      }
    }
    depthModel
    ageDepth {
      depthM
      eventFreeDepthM
      medianCalBp
      low95CalBp
      high95CalBp
    }
    samples {
      outlierProbability
      medianCalBp
      sample {
        id
        labCode
      }
      hpd95 {
        ...HpdRangeFields
      }
      offset {
        scaleYears
        medianYears
        low95Years
        high95Years
      }
    }
    reservoirOffsets {
      source
      named
      priorMeanYears
      priorSdYears
      medianYears
      low95Years
      high95Years
      samples {
        id
        labCode
      }
    }
  }
}
    fragment HpdRangeFields on HpdRange {
  olderCalBp
  youngerCalBp
  probability
}`) as unknown as TypedDocumentString<AgeModelRunQuery, AgeModelRunQueryVariables>;
export const AgeModelSiteDocument = new TypedDocumentString(`
    query AgeModelSite($id: ID!) {
  site(id: $id) {
    id
    name
    kind
    project {
      id
      name
      myRole
      myPermissions
    }
    units {
      id
      position
      name
      topDepthM
      baseDepthM
      facies
      basalErosionM
    }
    eventHorizons {
      id
      name
      quality
      unitBelow {
        id
        position
      }
      unitAbove {
        id
        position
      }
    }
    samples {
      id
      labCode
      method
      material
      ageRelation
      excluded
      unit {
        id
        position
      }
      depthM
      calibrationError
      calibration {
        medianCalBp
        hpd95 {
          ...HpdRangeFields
        }
        densityGrid {
          startCalBp
          stepYears
          values
        }
      }
    }
    latestAgeModelRun {
      id
      status
      stale
    }
    downstreamRun {
      id
    }
    downstreamRunChoice {
      run {
        id
      }
      chosenAt
      chosenBy {
        displayName
      }
    }
    ageModelRuns {
      id
      status
      progress
      seed
      settings
      depthModel
      stale
      createdAt
      finishedAt
      diagnostics {
        converged
        maxRhat
        minEss
      }
    }
  }
}
    fragment HpdRangeFields on HpdRange {
  olderCalBp
  youngerCalBp
  probability
}`) as unknown as TypedDocumentString<AgeModelSiteQuery, AgeModelSiteQueryVariables>;
export const StartAgeModelRunDocument = new TypedDocumentString(`
    mutation StartAgeModelRun($input: StartAgeModelRunInput!) {
  startAgeModelRun(input: $input) {
    id
    status
  }
}
    `) as unknown as TypedDocumentString<StartAgeModelRunMutation, StartAgeModelRunMutationVariables>;
export const CancelAgeModelRunDocument = new TypedDocumentString(`
    mutation CancelAgeModelRun($id: ID!) {
  cancelAgeModelRun(id: $id) {
    id
    status
  }
}
    `) as unknown as TypedDocumentString<CancelAgeModelRunMutation, CancelAgeModelRunMutationVariables>;
export const ChooseDownstreamRunDocument = new TypedDocumentString(`
    mutation ChooseDownstreamRun($input: ChooseDownstreamRunInput!) {
  chooseDownstreamRun(input: $input) {
    id
    downstreamRun {
      id
    }
  }
}
    `) as unknown as TypedDocumentString<ChooseDownstreamRunMutation, ChooseDownstreamRunMutationVariables>;
export const SiteAttachmentsDocument = new TypedDocumentString(`
    query SiteAttachments($id: ID!) {
  site(id: $id) {
    id
    project {
      id
      myRole
      myPermissions
    }
    attachments {
      id
      fileName
      contentType
      sizeBytes
      createdAt
      url
      thumbnailUrl
    }
    samples {
      id
      labCode
      attachments {
        id
        fileName
        contentType
        sizeBytes
        createdAt
        url
        thumbnailUrl
      }
    }
  }
}
    `) as unknown as TypedDocumentString<SiteAttachmentsQuery, SiteAttachmentsQueryVariables>;
export const DeleteAttachmentDocument = new TypedDocumentString(`
    mutation DeleteAttachment($id: ID!) {
  deleteAttachment(id: $id)
}
    `) as unknown as TypedDocumentString<DeleteAttachmentMutation, DeleteAttachmentMutationVariables>;
export const AuditTrailDocument = new TypedDocumentString(`
    query AuditTrail($input: AuditTrailInput!) {
  auditTrail(input: $input) {
    edges {
      cursor
      node {
        id
        at
        actor {
          id
          email
          displayName
        }
        action
        objectType
        objectId
        objectName
        referencedNames {
          id
          name
        }
        before
        after
      }
    }
    pageInfo {
      endCursor
      hasNextPage
    }
  }
}
    `) as unknown as TypedDocumentString<AuditTrailQuery, AuditTrailQueryVariables>;
export const SignInDocument = new TypedDocumentString(`
    mutation SignIn($email: String!, $password: String!) {
  signIn(email: $email, password: $password) {
    token
    user {
      id
      email
      displayName
    }
  }
}
    `) as unknown as TypedDocumentString<SignInMutation, SignInMutationVariables>;
export const MeDocument = new TypedDocumentString(`
    query Me {
  me {
    id
    email
    displayName
  }
}
    `) as unknown as TypedDocumentString<MeQuery, MeQueryVariables>;
export const CalibrateDocument = new TypedDocumentString(`
    query Calibrate($input: CalibrateInput!) {
  calibrate(input: $input) {
    curve
    medianCalBp
    meanCalBp
    sdYears
    hpd68 {
      ...HpdRangeFields
    }
    hpd95 {
      ...HpdRangeFields
    }
    densityGrid {
      startCalBp
      stepYears
      values
    }
    warnings
  }
}
    fragment HpdRangeFields on HpdRange {
  olderCalBp
  youngerCalBp
  probability
}`) as unknown as TypedDocumentString<CalibrateQuery, CalibrateQueryVariables>;
export const CalibrationCurvesDocument = new TypedDocumentString(`
    query CalibrationCurves {
  calibrationCurves {
    code
    name
    marine
    builtIn
    youngestCalBp
    oldestCalBp
  }
}
    `) as unknown as TypedDocumentString<CalibrationCurvesQuery, CalibrationCurvesQueryVariables>;
export const CalibrationCurveBandDocument = new TypedDocumentString(`
    query CalibrationCurveBand($curve: CurveCode!, $youngerCalBp: Int!, $olderCalBp: Int!) {
  calibrationCurveBand(
    curve: $curve
    youngerCalBp: $youngerCalBp
    olderCalBp: $olderCalBp
  ) {
    calBp
    c14Age
    c14Sigma
  }
}
    `) as unknown as TypedDocumentString<CalibrationCurveBandQuery, CalibrationCurveBandQueryVariables>;
export const SiteCalibrationsDocument = new TypedDocumentString(`
    query SiteCalibrations($id: ID!) {
  site(id: $id) {
    id
    samples {
      id
      labCode
      method
      c14Age
      c14Error
      curve
      deltaR
      deltaRError
      excluded
      unit {
        id
        name
        position
      }
      calibration {
        curve
        medianCalBp
        meanCalBp
        sdYears
        hpd68 {
          ...HpdRangeFields
        }
        hpd95 {
          ...HpdRangeFields
        }
        densityGrid {
          startCalBp
          stepYears
          values
        }
        warnings
      }
    }
  }
}
    fragment HpdRangeFields on HpdRange {
  olderCalBp
  youngerCalBp
  probability
}`) as unknown as TypedDocumentString<SiteCalibrationsQuery, SiteCalibrationsQueryVariables>;
export const SiteCoreLogsDocument = new TypedDocumentString(`
    query SiteCoreLogs($id: ID!) {
  site(id: $id) {
    id
    name
    units {
      id
      position
      name
      topDepthM
      baseDepthM
      facies
      basalErosionM
    }
    eventHorizons {
      id
      name
      unitAbove {
        id
      }
    }
    samples {
      id
      labCode
      depthM
      excluded
      calibration {
        medianCalBp
        hpd95 {
          olderCalBp
          youngerCalBp
        }
      }
    }
    coreLogs {
      id
      name
      channels
      units
      topDepthM
      baseDepthM
      rowCount
      traces(maxPoints: 300) {
        channel
        unit
        depthsM
        values
      }
    }
  }
}
    `) as unknown as TypedDocumentString<SiteCoreLogsQuery, SiteCoreLogsQueryVariables>;
export const UploadCoreLogDocument = new TypedDocumentString(`
    mutation UploadCoreLog($input: UploadCoreLogInput!) {
  uploadCoreLog(input: $input) {
    id
    channels
  }
}
    `) as unknown as TypedDocumentString<UploadCoreLogMutation, UploadCoreLogMutationVariables>;
export const DeleteCoreLogDocument = new TypedDocumentString(`
    mutation DeleteCoreLog($id: ID!) {
  deleteCoreLog(id: $id)
}
    `) as unknown as TypedDocumentString<DeleteCoreLogMutation, DeleteCoreLogMutationVariables>;
export const JointRunDocument = new TypedDocumentString(`
    query JointRun($id: ID!) {
  jointAgeModelRun(id: $id) {
    id
    status
    progress
    message
    seed
    hypothesisVersion
    createdAt
    finishedAt
    stale
    staleReasons {
      message
    }
    chains {
      index
      status
      progress
      message
    }
    depthModels {
      siteId
      siteName
      depthModel
    }
    diagnostics {
      converged
      maxRhat
      minEss
      message
    }
    regionalEvents {
      id
      medianCalBp
      rhat
      ess
      members {
        id
        name
      }
      hpd95 {
        olderCalBp
        youngerCalBp
        probability
      }
    }
  }
}
    `) as unknown as TypedDocumentString<JointRunQuery, JointRunQueryVariables>;
export const StartJointAgeModelRunDocument = new TypedDocumentString(`
    mutation StartJointAgeModelRun($input: StartJointAgeModelRunInput!) {
  startJointAgeModelRun(input: $input) {
    id
    status
  }
}
    `) as unknown as TypedDocumentString<StartJointAgeModelRunMutation, StartJointAgeModelRunMutationVariables>;
export const CancelJointAgeModelRunDocument = new TypedDocumentString(`
    mutation CancelJointAgeModelRun($id: ID!) {
  cancelJointAgeModelRun(id: $id) {
    id
    status
  }
}
    `) as unknown as TypedDocumentString<CancelJointAgeModelRunMutation, CancelJointAgeModelRunMutationVariables>;
export const EventLadderDocument = new TypedDocumentString(`
    query EventLadder($projectId: ID!) {
  eventLadder(projectId: $projectId) {
    columns {
      site {
        id
        name
        kind
        alongStrikeKm
        segment {
          id
          name
        }
      }
      latestAgeModelRun {
        id
        stale
      }
      events {
        medianCalBp
        eventHorizon {
          id
          name
          quality
        }
        hpd95 {
          olderCalBp
          youngerCalBp
          probability
        }
        densityGrid {
          startCalBp
          stepYears
          values
        }
      }
    }
  }
  project(id: $projectId) {
    id
    name
    myRole
    myPermissions
    tectonicSetting
    segments {
      id
      name
      startKm
      endKm
    }
    hypotheses {
      id
      name
      preferred
      version
    }
  }
}
    `) as unknown as TypedDocumentString<EventLadderQuery, EventLadderQueryVariables>;
export const HypothesisDocument = new TypedDocumentString(`
    query Hypothesis($id: ID!) {
  hypothesis(id: $id) {
    id
    name
    description
    preferred
    version
    author {
      id
      displayName
    }
    copiedFrom {
      id
      name
    }
    ties {
      id
      confidence
      evidence
      note
      eventA {
        id
        name
      }
      eventB {
        id
        name
      }
    }
    latestJointRun {
      id
      status
    }
    regionalEvents {
      id
      combinedMedianCalBp
      jointMedianCalBp
      jointHpd95 {
        olderCalBp
        youngerCalBp
        probability
      }
      ageShown
      concordance
      concordanceThreshold
      concordanceLow
      warnings
      ruptureLengthKm
      members {
        id
        name
      }
      combinedHpd95 {
        olderCalBp
        youngerCalBp
        probability
      }
      chiSquare {
        t
        df
        critical5
        passes
      }
      magnitude {
        mw
        sigma
        relation
      }
      magnitudeFromArea {
        mw
        sigma
        relation
      }
      magnitudeFromDisplacement {
        mw
        sigma
        relation
      }
      ageModelRuns {
        id
        seed
        stale
        site {
          id
          name
        }
      }
    }
    orderConflicts {
      message
      tieA {
        id
      }
      tieB {
        id
      }
      ties {
        id
        eventA {
          id
        }
        eventB {
          id
        }
      }
      steps {
        site {
          id
        }
        older {
          id
        }
        younger {
          id
        }
      }
      regionalEventIds
    }
  }
}
    `) as unknown as TypedDocumentString<HypothesisQuery, HypothesisQueryVariables>;
export const AddTieDocument = new TypedDocumentString(`
    mutation AddTie($input: AddTieInput!) {
  addTie(input: $input) {
    id
  }
}
    `) as unknown as TypedDocumentString<AddTieMutation, AddTieMutationVariables>;
export const RemoveTieDocument = new TypedDocumentString(`
    mutation RemoveTie($id: ID!) {
  removeTie(id: $id)
}
    `) as unknown as TypedDocumentString<RemoveTieMutation, RemoveTieMutationVariables>;
export const CreateHypothesisDocument = new TypedDocumentString(`
    mutation CreateHypothesis($input: CreateHypothesisInput!) {
  createHypothesis(input: $input) {
    id
    name
  }
}
    `) as unknown as TypedDocumentString<CreateHypothesisMutation, CreateHypothesisMutationVariables>;
export const SetPreferredHypothesisDocument = new TypedDocumentString(`
    mutation SetPreferredHypothesis($id: ID!) {
  setPreferredHypothesis(id: $id) {
    id
    preferred
  }
}
    `) as unknown as TypedDocumentString<SetPreferredHypothesisMutation, SetPreferredHypothesisMutationVariables>;
export const HypothesisSizeProfilesDocument = new TypedDocumentString(`
    query HypothesisSizeProfiles($id: ID!) {
  hypothesis(id: $id) {
    id
    regionalEvents {
      id
      combinedMedianCalBp
      members {
        id
        name
      }
      sizeProfile {
        eventHorizon {
          id
          name
        }
        site {
          id
          name
        }
        alongStrikeKm
        subsidenceM
        subsidenceErrorM
        displacementM
        displacementErrorM
        bedThicknessM
      }
    }
  }
}
    `) as unknown as TypedDocumentString<HypothesisSizeProfilesQuery, HypothesisSizeProfilesQueryVariables>;
export const LadderCoreLogsDocument = new TypedDocumentString(`
    query LadderCoreLogs($id: ID!) {
  site(id: $id) {
    id
    units {
      id
      position
      name
      topDepthM
      baseDepthM
      facies
    }
    eventHorizons {
      id
      unitAbove {
        id
      }
    }
    coreLogs {
      id
      name
      channels
      units
      traces(maxPoints: 400) {
        channel
        unit
        depthsM
        values
      }
    }
  }
}
    `) as unknown as TypedDocumentString<LadderCoreLogsQuery, LadderCoreLogsQueryVariables>;
export const TieSuggestionsDocument = new TypedDocumentString(`
    query TieSuggestions($input: TieSuggestionsInput!) {
  tieSuggestions(input: $input) {
    eventA {
      id
      name
    }
    eventB {
      id
      name
    }
    score
    tied
    channels
  }
}
    `) as unknown as TypedDocumentString<TieSuggestionsQuery, TieSuggestionsQueryVariables>;
export const ImportSamplesDocument = new TypedDocumentString(`
    mutation ImportSamples($input: ImportSamplesInput!) {
  importSamples(input: $input) {
    rowCount
    committed
    errors {
      row
      scope
      field
      message
    }
    columns {
      header
      field
      source
    }
    preview {
      row
      labCode
      unitName
      medianCalBp
      hpd95 {
        ...HpdRangeFields
      }
      warnings
    }
  }
}
    fragment HpdRangeFields on HpdRange {
  olderCalBp
  youngerCalBp
  probability
}`) as unknown as TypedDocumentString<ImportSamplesMutation, ImportSamplesMutationVariables>;
export const ProjectsDocument = new TypedDocumentString(`
    query Projects {
  projects {
    id
    name
    description
    tectonicSetting
    myRole
    myPermissions
  }
}
    `) as unknown as TypedDocumentString<ProjectsQuery, ProjectsQueryVariables>;
export const ProjectOverviewDocument = new TypedDocumentString(`
    query ProjectOverview($id: ID!) {
  project(id: $id) {
    id
    name
    description
    tectonicSetting
    myRole
    myPermissions
    segments {
      id
      version
      name
      startKm
      endKm
      notes
      downDipWidthKm
    }
    sites {
      id
      version
      name
      kind
      latitude
      longitude
      alongStrikeKm
      elevationM
      waterDepthM
      notes
      segment {
        id
        name
      }
      eventHorizons {
        id
      }
      samples {
        id
      }
    }
  }
}
    `) as unknown as TypedDocumentString<ProjectOverviewQuery, ProjectOverviewQueryVariables>;
export const CreateSegmentDocument = new TypedDocumentString(`
    mutation CreateSegment($input: CreateSegmentInput!) {
  createSegment(input: $input) {
    id
  }
}
    `) as unknown as TypedDocumentString<CreateSegmentMutation, CreateSegmentMutationVariables>;
export const UpdateSegmentDocument = new TypedDocumentString(`
    mutation UpdateSegment($id: ID!, $version: Int!, $input: UpdateSegmentInput!) {
  updateSegment(id: $id, version: $version, input: $input) {
    id
    version
  }
}
    `) as unknown as TypedDocumentString<UpdateSegmentMutation, UpdateSegmentMutationVariables>;
export const DeleteSegmentDocument = new TypedDocumentString(`
    mutation DeleteSegment($id: ID!) {
  deleteSegment(id: $id)
}
    `) as unknown as TypedDocumentString<DeleteSegmentMutation, DeleteSegmentMutationVariables>;
export const CreateSiteDocument = new TypedDocumentString(`
    mutation CreateSite($input: CreateSiteInput!) {
  createSite(input: $input) {
    id
  }
}
    `) as unknown as TypedDocumentString<CreateSiteMutation, CreateSiteMutationVariables>;
export const UpdateSiteDocument = new TypedDocumentString(`
    mutation UpdateSite($id: ID!, $version: Int!, $input: UpdateSiteInput!) {
  updateSite(id: $id, version: $version, input: $input) {
    id
    version
  }
}
    `) as unknown as TypedDocumentString<UpdateSiteMutation, UpdateSiteMutationVariables>;
export const DeleteSiteDocument = new TypedDocumentString(`
    mutation DeleteSite($id: ID!) {
  deleteSite(id: $id)
}
    `) as unknown as TypedDocumentString<DeleteSiteMutation, DeleteSiteMutationVariables>;
export const SegmentEventTableDocument = new TypedDocumentString(`
    query SegmentEventTable($input: SegmentEventTableInput!) {
  segmentEventTable(input: $input) {
    ...SegmentEventTableFields
  }
}
    fragment SegmentEventTableFields on SegmentEventTable {
  segmentId
  segmentName
  segmentStartKm
  segmentEndKm
  hypothesisId
  hypothesisName
  hypothesisVersion
  rule {
    minimumSpanShare
    includeUntied
    qualityWeights
    confidenceWeights
  }
  rows {
    regionalEventId
    label
    members {
      eventHorizonId
      eventName
      siteId
      siteName
      alongStrikeKm
      segmentName
      quality
    }
    segmentNames
    spanShare
    throughGoing
    untied
    tieConfidences
    qualities
    medianCalBp
    counted
    inclusionProbability
    reason
  }
  countedEvents
  expectedEvents
  weighted
  note
}`) as unknown as TypedDocumentString<SegmentEventTableQuery, SegmentEventTableQueryVariables>;
export const AnalysisEventTableDocument = new TypedDocumentString(`
    query AnalysisEventTable($id: ID!) {
  recurrenceAnalysis(id: $id) {
    id
    recordEvents {
      median
      low95
      high95
    }
    intervals {
      index
      shareOfDraws
    }
    eventTable {
      ...SegmentEventTableFields
    }
  }
}
    fragment SegmentEventTableFields on SegmentEventTable {
  segmentId
  segmentName
  segmentStartKm
  segmentEndKm
  hypothesisId
  hypothesisName
  hypothesisVersion
  rule {
    minimumSpanShare
    includeUntied
    qualityWeights
    confidenceWeights
  }
  rows {
    regionalEventId
    label
    members {
      eventHorizonId
      eventName
      siteId
      siteName
      alongStrikeKm
      segmentName
      quality
    }
    segmentNames
    spanShare
    throughGoing
    untied
    tieConfidences
    qualities
    medianCalBp
    counted
    inclusionProbability
    reason
  }
  countedEvents
  expectedEvents
  weighted
  note
}`) as unknown as TypedDocumentString<AnalysisEventTableQuery, AnalysisEventTableQueryVariables>;
export const RecurrenceComparisonDocument = new TypedDocumentString(`
    query RecurrenceComparison($analysisAId: ID!, $analysisBId: ID!) {
  recurrenceComparison(analysisAId: $analysisAId, analysisBId: $analysisBId) {
    analysisA {
      id
      hypothesis {
        id
        name
      }
      hypothesisVersion
    }
    analysisB {
      id
      hypothesis {
        id
        name
      }
      hypothesisVersion
    }
    settingDifferences
    events {
      regionalEventId
      label
      difference
      a {
        counted
        inclusionProbability
        spanShare
        throughGoing
        untied
        medianCalBp
        reason
      }
      b {
        counted
        inclusionProbability
        spanShare
        throughGoing
        untied
        medianCalBp
        reason
      }
    }
    statistics {
      quantity
      unit
      a {
        median
        low95
        high95
      }
      b {
        median
        low95
        high95
      }
      medianDifference
      rangesOverlap
    }
    probabilities {
      model
      windowYears
      a {
        median
        low95
        high95
      }
      b {
        median
        low95
        high95
      }
      medianDifference
      rangesOverlap
    }
    note
    caution
  }
}
    `) as unknown as TypedDocumentString<RecurrenceComparisonQuery, RecurrenceComparisonQueryVariables>;
export const RecurrenceSetupDocument = new TypedDocumentString(`
    query RecurrenceSetup($projectId: ID!) {
  project(id: $projectId) {
    id
    name
    myRole
    myPermissions
    segments {
      id
      name
    }
    sites {
      id
      name
      kind
    }
    hypotheses {
      id
      name
      preferred
    }
    preferredHypothesis {
      id
    }
    recurrenceAnalyses {
      id
      status
      createdAt
      forecastStartYear
      draws
      segment {
        id
        name
      }
      site {
        id
        name
      }
      hypothesis {
        id
        name
      }
    }
  }
}
    `) as unknown as TypedDocumentString<RecurrenceSetupQuery, RecurrenceSetupQueryVariables>;
export const RecurrenceAnalysisDocument = new TypedDocumentString(`
    query RecurrenceAnalysis($id: ID!) {
  recurrenceAnalysis(id: $id) {
    id
    status
    progress
    message
    seed
    forecastStartYear
    windowsYears
    draws
    createdAt
    finishedAt
    hypothesisVersion
    stale
    staleReasons {
      message
      via
    }
    inputs {
      ageModelRuns {
        id
        site {
          id
          name
        }
      }
      hypothesisVersion
    }
    segment {
      id
      name
    }
    site {
      id
      name
    }
    hypothesis {
      id
      name
    }
    eventCount
    lastEventMedianCalBp
    openInterval {
      median
      low95
      high95
    }
    intervals {
      index
      medianYears
      low95
      high95
      youngerEvent
      olderEvent
    }
    meanRecurrence {
      median
      low95
      high95
    }
    medianRecurrence {
      median
      low95
      high95
    }
    sdRecurrence {
      median
      low95
      high95
    }
    aperiodicity {
      median
      low95
      high95
    }
    poisson {
      windowYears
      median
      low95
      high95
    }
    models {
      model
      aic
      deltaAic
      aicc
      deltaAicc
      akaikeWeight
      meanRecurrenceYears
      aperiodicity
      logLikelihood
      meanRecurrenceRange {
        median
        low95
        high95
        datingOnlyLow95
        datingOnlyHigh95
      }
      aperiodicityRange {
        median
        low95
        high95
        datingOnlyLow95
        datingOnlyHigh95
      }
      probabilities {
        windowYears
        median
        low95
        high95
        datingOnlyLow95
        datingOnlyHigh95
      }
    }
    modelAveraged {
      windowYears
      median
      low95
      high95
      datingOnlyLow95
      datingOnlyHigh95
    }
    parameterNote
    modelComparisonNote
    curves {
      model
      density {
        years
        value
      }
      hazard {
        years
        value
      }
      survival {
        years
        value
      }
    }
    histogram {
      fromYears
      toYears
      count
    }
    caution
  }
}
    `) as unknown as TypedDocumentString<RecurrenceAnalysisQuery, RecurrenceAnalysisQueryVariables>;
export const StartRecurrenceAnalysisDocument = new TypedDocumentString(`
    mutation StartRecurrenceAnalysis($input: StartRecurrenceAnalysisInput!) {
  startRecurrenceAnalysis(input: $input) {
    id
    status
  }
}
    `) as unknown as TypedDocumentString<StartRecurrenceAnalysisMutation, StartRecurrenceAnalysisMutationVariables>;
export const CancelRecurrenceAnalysisDocument = new TypedDocumentString(`
    mutation CancelRecurrenceAnalysis($id: ID!) {
  cancelRecurrenceAnalysis(id: $id) {
    id
    status
  }
}
    `) as unknown as TypedDocumentString<CancelRecurrenceAnalysisMutation, CancelRecurrenceAnalysisMutationVariables>;
export const RefreshStaleResultsDocument = new TypedDocumentString(`
    mutation RefreshStaleResults($projectId: ID!) {
  refreshStaleResults(projectId: $projectId) {
    id
  }
}
    `) as unknown as TypedDocumentString<RefreshStaleResultsMutation, RefreshStaleResultsMutationVariables>;
export const LatestRefreshDocument = new TypedDocumentString(`
    query LatestRefresh($projectId: ID!) {
  project(id: $projectId) {
    id
    refreshSettings {
      automatic
      debounceSeconds
    }
    downstreamRunChoices {
      site {
        id
        name
      }
      run {
        id
        createdAt
      }
      newestRun {
        id
        createdAt
      }
      newerRunExists
    }
    refreshPlans {
      id
      status
      automatic
      createdAt
      steps {
        id
        stage
        kind
        label
        status
        message
        freshId
        waitingFor
      }
      ageModelRuns {
        id
        site {
          id
        }
      }
      skipped {
        id
        kind
        label
        reason
      }
      progress {
        total
        waiting
        running
        succeeded
        failed
        blocked
        skipped
        fraction
      }
    }
  }
}
    `) as unknown as TypedDocumentString<LatestRefreshQuery, LatestRefreshQueryVariables>;
export const SetRefreshSettingsDocument = new TypedDocumentString(`
    mutation SetRefreshSettings($input: SetRefreshSettingsInput!) {
  setRefreshSettings(input: $input) {
    automatic
    debounceSeconds
  }
}
    `) as unknown as TypedDocumentString<SetRefreshSettingsMutation, SetRefreshSettingsMutationVariables>;
export const ProjectReleasesDocument = new TypedDocumentString(`
    query ProjectReleases($id: ID!) {
  project(id: $id) {
    id
    myRole
    myPermissions
    releases {
      id
      number
      note
      createdAt
      createdBy {
        id
        displayName
        email
      }
    }
  }
}
    `) as unknown as TypedDocumentString<ProjectReleasesQuery, ProjectReleasesQueryVariables>;
export const ReleaseDocument = new TypedDocumentString(`
    query Release($id: ID!) {
  release(id: $id) {
    id
    number
    note
    createdAt
    createdBy {
      id
      displayName
    }
    segments {
      id
      name
      startKm
      endKm
    }
    sites {
      id
      name
      kind
      latitude
      longitude
      alongStrikeKm
      segment {
        id
        name
      }
      units {
        id
      }
      eventHorizons {
        id
      }
      samples {
        id
      }
    }
  }
}
    `) as unknown as TypedDocumentString<ReleaseQuery, ReleaseQueryVariables>;
export const ReleaseDiffDocument = new TypedDocumentString(`
    query ReleaseDiff($fromId: ID!, $toId: ID!) {
  releaseDiff(fromId: $fromId, toId: $toId) {
    from {
      id
      number
    }
    to {
      id
      number
    }
    changes {
      objectType
      objectId
      label
      change
    }
  }
}
    `) as unknown as TypedDocumentString<ReleaseDiffQuery, ReleaseDiffQueryVariables>;
export const CreateReleaseDocument = new TypedDocumentString(`
    mutation CreateRelease($input: CreateReleaseInput!) {
  createRelease(input: $input) {
    id
    number
  }
}
    `) as unknown as TypedDocumentString<CreateReleaseMutation, CreateReleaseMutationVariables>;
export const CreateSampleDocument = new TypedDocumentString(`
    mutation CreateSample($input: CreateSampleInput!) {
  createSample(input: $input) {
    id
  }
}
    `) as unknown as TypedDocumentString<CreateSampleMutation, CreateSampleMutationVariables>;
export const UpdateSampleDocument = new TypedDocumentString(`
    mutation UpdateSample($id: ID!, $version: Int!, $input: UpdateSampleInput!) {
  updateSample(id: $id, version: $version, input: $input) {
    id
    version
  }
}
    `) as unknown as TypedDocumentString<UpdateSampleMutation, UpdateSampleMutationVariables>;
export const DeleteSampleDocument = new TypedDocumentString(`
    mutation DeleteSample($id: ID!) {
  deleteSample(id: $id)
}
    `) as unknown as TypedDocumentString<DeleteSampleMutation, DeleteSampleMutationVariables>;
export const SiteDocument = new TypedDocumentString(`
    query Site($id: ID!) {
  site(id: $id) {
    id
    version
    name
    kind
    latitude
    longitude
    alongStrikeKm
    elevationM
    waterDepthM
    notes
    project {
      id
      name
      myRole
      myPermissions
    }
    segment {
      id
      name
    }
    units {
      id
      version
      position
      name
      topDepthM
      baseDepthM
      facies
      basalErosionM
      notes
    }
    eventHorizons {
      id
      version
      name
      quality
      evidence
      notes
      subsidenceM
      subsidenceErrorM
      displacementM
      displacementErrorM
      bedThicknessM
      unitBelow {
        id
      }
      unitAbove {
        id
      }
    }
    samples {
      id
      version
      labCode
      method
      material
      depthM
      ageRelation
      c14Age
      c14Error
      delta13C
      curve
      deltaR
      deltaRError
      deltaRSource
      inheritanceScaleYears
      inheritanceScaleDefaultYears
      calendarAgeBp
      calendarErrorYears
      measurementYear
      excluded
      exclusionReason
      notes
      unit {
        id
      }
      calibrationError
      calibration {
        curve
        medianCalBp
        meanCalBp
        sdYears
        hpd68 {
          ...HpdRangeFields
        }
        hpd95 {
          ...HpdRangeFields
        }
        warnings
      }
    }
  }
}
    fragment HpdRangeFields on HpdRange {
  olderCalBp
  youngerCalBp
  probability
}`) as unknown as TypedDocumentString<SiteQuery, SiteQueryVariables>;
export const CreateUnitDocument = new TypedDocumentString(`
    mutation CreateUnit($input: CreateUnitInput!) {
  createUnit(input: $input) {
    id
  }
}
    `) as unknown as TypedDocumentString<CreateUnitMutation, CreateUnitMutationVariables>;
export const UpdateUnitDocument = new TypedDocumentString(`
    mutation UpdateUnit($id: ID!, $version: Int!, $input: UpdateUnitInput!) {
  updateUnit(id: $id, version: $version, input: $input) {
    id
    version
  }
}
    `) as unknown as TypedDocumentString<UpdateUnitMutation, UpdateUnitMutationVariables>;
export const DeleteUnitDocument = new TypedDocumentString(`
    mutation DeleteUnit($id: ID!) {
  deleteUnit(id: $id)
}
    `) as unknown as TypedDocumentString<DeleteUnitMutation, DeleteUnitMutationVariables>;
export const CreateEventHorizonDocument = new TypedDocumentString(`
    mutation CreateEventHorizon($input: CreateEventHorizonInput!) {
  createEventHorizon(input: $input) {
    id
  }
}
    `) as unknown as TypedDocumentString<CreateEventHorizonMutation, CreateEventHorizonMutationVariables>;
export const UpdateEventHorizonDocument = new TypedDocumentString(`
    mutation UpdateEventHorizon($id: ID!, $version: Int!, $input: UpdateEventHorizonInput!) {
  updateEventHorizon(id: $id, version: $version, input: $input) {
    id
    version
  }
}
    `) as unknown as TypedDocumentString<UpdateEventHorizonMutation, UpdateEventHorizonMutationVariables>;
export const DeleteEventHorizonDocument = new TypedDocumentString(`
    mutation DeleteEventHorizon($id: ID!) {
  deleteEventHorizon(id: $id)
}
    `) as unknown as TypedDocumentString<DeleteEventHorizonMutation, DeleteEventHorizonMutationVariables>;
export const AcceptInvitationDocument = new TypedDocumentString(`
    mutation AcceptInvitation($input: AcceptInvitationInput!) {
  acceptInvitation(input: $input) {
    token
    user {
      id
      email
      displayName
    }
  }
}
    `) as unknown as TypedDocumentString<AcceptInvitationMutation, AcceptInvitationMutationVariables>;
export const RequestPasswordResetDocument = new TypedDocumentString(`
    mutation RequestPasswordReset($email: String!) {
  requestPasswordReset(email: $email)
}
    `) as unknown as TypedDocumentString<RequestPasswordResetMutation, RequestPasswordResetMutationVariables>;
export const ResetPasswordDocument = new TypedDocumentString(`
    mutation ResetPassword($input: ResetPasswordInput!) {
  resetPassword(input: $input)
}
    `) as unknown as TypedDocumentString<ResetPasswordMutation, ResetPasswordMutationVariables>;
export const ProjectTeamDocument = new TypedDocumentString(`
    query ProjectTeam($id: ID!) {
  project(id: $id) {
    id
    name
    myRole
    myPermissions
    members {
      id
      role
      user {
        id
        email
        displayName
      }
    }
    invitations {
      id
      email
      role
      expiresAt
      acceptedAt
    }
  }
}
    `) as unknown as TypedDocumentString<ProjectTeamQuery, ProjectTeamQueryVariables>;
export const InviteMemberDocument = new TypedDocumentString(`
    mutation InviteMember($input: InviteMemberInput!) {
  inviteMember(input: $input) {
    id
    email
    role
    expiresAt
  }
}
    `) as unknown as TypedDocumentString<InviteMemberMutation, InviteMemberMutationVariables>;
export const SetMemberRoleDocument = new TypedDocumentString(`
    mutation SetMemberRole($input: SetMemberRoleInput!) {
  setMemberRole(input: $input) {
    id
    role
  }
}
    `) as unknown as TypedDocumentString<SetMemberRoleMutation, SetMemberRoleMutationVariables>;
export const RemoveMemberDocument = new TypedDocumentString(`
    mutation RemoveMember($projectId: ID!, $userId: ID!) {
  removeMember(projectId: $projectId, userId: $userId)
}
    `) as unknown as TypedDocumentString<RemoveMemberMutation, RemoveMemberMutationVariables>;
export const InvitationLinkDocument = new TypedDocumentString(`
    query InvitationLink($token: String!) {
  invitationLink(token: $token) {
    status
    projectName
  }
}
    `) as unknown as TypedDocumentString<InvitationLinkQuery, InvitationLinkQueryVariables>;