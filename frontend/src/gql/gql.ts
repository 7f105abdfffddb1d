/* eslint-disable */
import * as types from './graphql';



/**
 * Map of all GraphQL operations in the project.
 *
 * This map has several performance disadvantages:
 * 1. It is not tree-shakeable, so it will include all operations in the project.
 * 2. It is not minifiable, so the string of a GraphQL query will be multiple times inside the bundle.
 * 3. It does not support dead code elimination, so it will add unused operations.
 *
 * Therefore it is highly recommended to use the babel or swc plugin for production.
 * Learn more about it here: https://the-guild.dev/graphql/codegen/plugins/presets/preset-client#reducing-bundle-size
 */
type Documents = {
    "\n  mutation SignIn($email: String!, $password: String!) {\n    signIn(email: $email, password: $password) {\n      token\n      user {\n        id\n        email\n        displayName\n      }\n    }\n  }\n": typeof types.SignInDocument,
    "\n  query Me {\n    me {\n      id\n      email\n      displayName\n    }\n  }\n": typeof types.MeDocument,
    "\n  query Calibrate($input: CalibrateInput!) {\n    calibrate(input: $input) {\n      curve\n      medianCalBp\n      meanCalBp\n      sdYears\n      hpd68 {\n        olderCalBp\n        youngerCalBp\n        probability\n      }\n      hpd95 {\n        olderCalBp\n        youngerCalBp\n        probability\n      }\n      density {\n        calBp\n        probability\n      }\n      warnings\n    }\n  }\n": typeof types.CalibrateDocument,
    "\n  query CalibrationCurves {\n    calibrationCurves {\n      code\n      name\n      marine\n      builtIn\n      youngestCalBp\n      oldestCalBp\n    }\n  }\n": typeof types.CalibrationCurvesDocument,
    "\n  query CalibrationCurveBand($curve: CurveCode!, $youngerCalBp: Int!, $olderCalBp: Int!) {\n    calibrationCurveBand(curve: $curve, youngerCalBp: $youngerCalBp, olderCalBp: $olderCalBp) {\n      calBp\n      c14Age\n      c14Sigma\n    }\n  }\n": typeof types.CalibrationCurveBandDocument,
    "\n  query SiteCalibrations($id: ID!) {\n    site(id: $id) {\n      id\n      samples {\n        id\n        labCode\n        method\n        c14Age\n        c14Error\n        curve\n        deltaR\n        deltaRError\n        excluded\n        unit {\n          id\n          name\n          position\n        }\n        calibration {\n          curve\n          medianCalBp\n          hpd68 {\n            olderCalBp\n            youngerCalBp\n            probability\n          }\n          hpd95 {\n            olderCalBp\n            youngerCalBp\n            probability\n          }\n          density {\n            calBp\n            probability\n          }\n          warnings\n        }\n      }\n    }\n  }\n": typeof types.SiteCalibrationsDocument,
    "\n  mutation ImportSamples($input: ImportSamplesInput!) {\n    importSamples(input: $input) {\n      rowCount\n      committed\n      errors {\n        row\n        field\n        message\n      }\n      preview {\n        row\n        labCode\n        unitName\n        medianCalBp\n        hpd95 {\n          olderCalBp\n          youngerCalBp\n          probability\n        }\n        warnings\n      }\n    }\n  }\n": typeof types.ImportSamplesDocument,
    "\n  query Projects {\n    projects {\n      id\n      name\n      description\n      tectonicSetting\n      myRole\n    }\n  }\n": typeof types.ProjectsDocument,
    "\n  query ProjectOverview($id: ID!) {\n    project(id: $id) {\n      id\n      name\n      description\n      tectonicSetting\n      myRole\n      segments {\n        id\n        version\n        name\n        startKm\n        endKm\n        notes\n      }\n      sites {\n        id\n        version\n        name\n        kind\n        latitude\n        longitude\n        alongStrikeKm\n        elevationM\n        waterDepthM\n        notes\n        segment {\n          id\n          name\n        }\n        eventHorizons {\n          id\n        }\n        samples {\n          id\n        }\n      }\n    }\n  }\n": typeof types.ProjectOverviewDocument,
    "\n  mutation CreateSegment($input: CreateSegmentInput!) {\n    createSegment(input: $input) {\n      id\n    }\n  }\n": typeof types.CreateSegmentDocument,
    "\n  mutation UpdateSegment($id: ID!, $version: Int!, $input: UpdateSegmentInput!) {\n    updateSegment(id: $id, version: $version, input: $input) {\n      id\n      version\n    }\n  }\n": typeof types.UpdateSegmentDocument,
    "\n  mutation DeleteSegment($id: ID!) {\n    deleteSegment(id: $id)\n  }\n": typeof types.DeleteSegmentDocument,
    "\n  mutation CreateSite($input: CreateSiteInput!) {\n    createSite(input: $input) {\n      id\n    }\n  }\n": typeof types.CreateSiteDocument,
    "\n  mutation UpdateSite($id: ID!, $version: Int!, $input: UpdateSiteInput!) {\n    updateSite(id: $id, version: $version, input: $input) {\n      id\n      version\n    }\n  }\n": typeof types.UpdateSiteDocument,
    "\n  mutation DeleteSite($id: ID!) {\n    deleteSite(id: $id)\n  }\n": typeof types.DeleteSiteDocument,
    "\n  mutation CreateSample($input: CreateSampleInput!) {\n    createSample(input: $input) {\n      id\n    }\n  }\n": typeof types.CreateSampleDocument,
    "\n  mutation UpdateSample($id: ID!, $version: Int!, $input: UpdateSampleInput!) {\n    updateSample(id: $id, version: $version, input: $input) {\n      id\n      version\n    }\n  }\n": typeof types.UpdateSampleDocument,
    "\n  mutation DeleteSample($id: ID!) {\n    deleteSample(id: $id)\n  }\n": typeof types.DeleteSampleDocument,
    "\n  query Site($id: ID!) {\n    site(id: $id) {\n      id\n      version\n      name\n      kind\n      latitude\n      longitude\n      alongStrikeKm\n      elevationM\n      waterDepthM\n      notes\n      project {\n        id\n        name\n        myRole\n      }\n      segment {\n        id\n        name\n      }\n      units {\n        id\n        version\n        position\n        name\n        topDepthM\n        baseDepthM\n        facies\n        notes\n      }\n      eventHorizons {\n        id\n        version\n        name\n        quality\n        evidence\n        notes\n        unitBelow {\n          id\n        }\n        unitAbove {\n          id\n        }\n      }\n      samples {\n        id\n        version\n        labCode\n        method\n        material\n        depthM\n        ageRelation\n        c14Age\n        c14Error\n        delta13C\n        curve\n        deltaR\n        deltaRError\n        calendarAgeBp\n        calendarErrorYears\n        measurementYear\n        excluded\n        exclusionReason\n        notes\n        unit {\n          id\n        }\n        calibrationError\n        calibration {\n          curve\n          medianCalBp\n          meanCalBp\n          sdYears\n          hpd68 {\n            olderCalBp\n            youngerCalBp\n            probability\n          }\n          hpd95 {\n            olderCalBp\n            youngerCalBp\n            probability\n          }\n          warnings\n        }\n      }\n    }\n  }\n": typeof types.SiteDocument,
    "\n  mutation CreateUnit($input: CreateUnitInput!) {\n    createUnit(input: $input) {\n      id\n    }\n  }\n": typeof types.CreateUnitDocument,
    "\n  mutation UpdateUnit($id: ID!, $version: Int!, $input: UpdateUnitInput!) {\n    updateUnit(id: $id, version: $version, input: $input) {\n      id\n      version\n    }\n  }\n": typeof types.UpdateUnitDocument,
    "\n  mutation DeleteUnit($id: ID!) {\n    deleteUnit(id: $id)\n  }\n": typeof types.DeleteUnitDocument,
    "\n  mutation CreateEventHorizon($input: CreateEventHorizonInput!) {\n    createEventHorizon(input: $input) {\n      id\n    }\n  }\n": typeof types.CreateEventHorizonDocument,
    "\n  mutation UpdateEventHorizon($id: ID!, $version: Int!, $input: UpdateEventHorizonInput!) {\n    updateEventHorizon(id: $id, version: $version, input: $input) {\n      id\n      version\n    }\n  }\n": typeof types.UpdateEventHorizonDocument,
    "\n  mutation DeleteEventHorizon($id: ID!) {\n    deleteEventHorizon(id: $id)\n  }\n": typeof types.DeleteEventHorizonDocument,
};
const documents: Documents = {
    "\n  mutation SignIn($email: String!, $password: String!) {\n    signIn(email: $email, password: $password) {\n      token\n      user {\n        id\n        email\n        displayName\n      }\n    }\n  }\n": types.SignInDocument,
    "\n  query Me {\n    me {\n      id\n      email\n      displayName\n    }\n  }\n": types.MeDocument,
    "\n  query Calibrate($input: CalibrateInput!) {\n    calibrate(input: $input) {\n      curve\n      medianCalBp\n      meanCalBp\n      sdYears\n      hpd68 {\n        olderCalBp\n        youngerCalBp\n        probability\n      }\n      hpd95 {\n        olderCalBp\n        youngerCalBp\n        probability\n      }\n      density {\n        calBp\n        probability\n      }\n      warnings\n    }\n  }\n": types.CalibrateDocument,
    "\n  query CalibrationCurves {\n    calibrationCurves {\n      code\n      name\n      marine\n      builtIn\n      youngestCalBp\n      oldestCalBp\n    }\n  }\n": types.CalibrationCurvesDocument,
    "\n  query CalibrationCurveBand($curve: CurveCode!, $youngerCalBp: Int!, $olderCalBp: Int!) {\n    calibrationCurveBand(curve: $curve, youngerCalBp: $youngerCalBp, olderCalBp: $olderCalBp) {\n      calBp\n      c14Age\n      c14Sigma\n    }\n  }\n": types.CalibrationCurveBandDocument,
    "\n  query SiteCalibrations($id: ID!) {\n    site(id: $id) {\n      id\n      samples {\n        id\n        labCode\n        method\n        c14Age\n        c14Error\n        curve\n        deltaR\n        deltaRError\n        excluded\n        unit {\n          id\n          name\n          position\n        }\n        calibration {\n          curve\n          medianCalBp\n          hpd68 {\n            olderCalBp\n            youngerCalBp\n            probability\n          }\n          hpd95 {\n            olderCalBp\n            youngerCalBp\n            probability\n          }\n          density {\n            calBp\n            probability\n          }\n          warnings\n        }\n      }\n    }\n  }\n": types.SiteCalibrationsDocument,
    "\n  mutation ImportSamples($input: ImportSamplesInput!) {\n    importSamples(input: $input) {\n      rowCount\n      committed\n      errors {\n        row\n        field\n        message\n      }\n      preview {\n        row\n        labCode\n        unitName\n        medianCalBp\n        hpd95 {\n          olderCalBp\n          youngerCalBp\n          probability\n        }\n        warnings\n      }\n    }\n  }\n": types.ImportSamplesDocument,
    "\n  query Projects {\n    projects {\n      id\n      name\n      description\n      tectonicSetting\n      myRole\n    }\n  }\n": types.ProjectsDocument,
    "\n  query ProjectOverview($id: ID!) {\n    project(id: $id) {\n      id\n      name\n      description\n      tectonicSetting\n      myRole\n      segments {\n        id\n        version\n        name\n        startKm\n        endKm\n        notes\n      }\n      sites {\n        id\n        version\n        name\n        kind\n        latitude\n        longitude\n        alongStrikeKm\n        elevationM\n        waterDepthM\n        notes\n        segment {\n          id\n          name\n        }\n        eventHorizons {\n          id\n        }\n        samples {\n          id\n        }\n      }\n    }\n  }\n": types.ProjectOverviewDocument,
    "\n  mutation CreateSegment($input: CreateSegmentInput!) {\n    createSegment(input: $input) {\n      id\n    }\n  }\n": types.CreateSegmentDocument,
    "\n  mutation UpdateSegment($id: ID!, $version: Int!, $input: UpdateSegmentInput!) {\n    updateSegment(id: $id, version: $version, input: $input) {\n      id\n      version\n    }\n  }\n": types.UpdateSegmentDocument,
    "\n  mutation DeleteSegment($id: ID!) {\n    deleteSegment(id: $id)\n  }\n": types.DeleteSegmentDocument,
    "\n  mutation CreateSite($input: CreateSiteInput!) {\n    createSite(input: $input) {\n      id\n    }\n  }\n": types.CreateSiteDocument,
    "\n  mutation UpdateSite($id: ID!, $version: Int!, $input: UpdateSiteInput!) {\n    updateSite(id: $id, version: $version, input: $input) {\n      id\n      version\n    }\n  }\n": types.UpdateSiteDocument,
    "\n  mutation DeleteSite($id: ID!) {\n    deleteSite(id: $id)\n  }\n": types.DeleteSiteDocument,
    "\n  mutation CreateSample($input: CreateSampleInput!) {\n    createSample(input: $input) {\n      id\n    }\n  }\n": types.CreateSampleDocument,
    "\n  mutation UpdateSample($id: ID!, $version: Int!, $input: UpdateSampleInput!) {\n    updateSample(id: $id, version: $version, input: $input) {\n      id\n      version\n    }\n  }\n": types.UpdateSampleDocument,
    "\n  mutation DeleteSample($id: ID!) {\n    deleteSample(id: $id)\n  }\n": types.DeleteSampleDocument,
    "\n  query Site($id: ID!) {\n    site(id: $id) {\n      id\n      version\n      name\n      kind\n      latitude\n      longitude\n      alongStrikeKm\n      elevationM\n      waterDepthM\n      notes\n      project {\n        id\n        name\n        myRole\n      }\n      segment {\n        id\n        name\n      }\n      units {\n        id\n        version\n        position\n        name\n        topDepthM\n        baseDepthM\n        facies\n        notes\n      }\n      eventHorizons {\n        id\n        version\n        name\n        quality\n        evidence\n        notes\n        unitBelow {\n          id\n        }\n        unitAbove {\n          id\n        }\n      }\n      samples {\n        id\n        version\n        labCode\n        method\n        material\n        depthM\n        ageRelation\n        c14Age\n        c14Error\n        delta13C\n        curve\n        deltaR\n        deltaRError\n        calendarAgeBp\n        calendarErrorYears\n        measurementYear\n        excluded\n        exclusionReason\n        notes\n        unit {\n          id\n        }\n        calibrationError\n        calibration {\n          curve\n          medianCalBp\n          meanCalBp\n          sdYears\n          hpd68 {\n            olderCalBp\n            youngerCalBp\n            probability\n          }\n          hpd95 {\n            olderCalBp\n            youngerCalBp\n            probability\n          }\n          warnings\n        }\n      }\n    }\n  }\n": types.SiteDocument,
    "\n  mutation CreateUnit($input: CreateUnitInput!) {\n    createUnit(input: $input) {\n      id\n    }\n  }\n": types.CreateUnitDocument,
    "\n  mutation UpdateUnit($id: ID!, $version: Int!, $input: UpdateUnitInput!) {\n    updateUnit(id: $id, version: $version, input: $input) {\n      id\n      version\n    }\n  }\n": types.UpdateUnitDocument,
    "\n  mutation DeleteUnit($id: ID!) {\n    deleteUnit(id: $id)\n  }\n": types.DeleteUnitDocument,
    "\n  mutation CreateEventHorizon($input: CreateEventHorizonInput!) {\n    createEventHorizon(input: $input) {\n      id\n    }\n  }\n": types.CreateEventHorizonDocument,
    "\n  mutation UpdateEventHorizon($id: ID!, $version: Int!, $input: UpdateEventHorizonInput!) {\n    updateEventHorizon(id: $id, version: $version, input: $input) {\n      id\n      version\n    }\n  }\n": types.UpdateEventHorizonDocument,
    "\n  mutation DeleteEventHorizon($id: ID!) {\n    deleteEventHorizon(id: $id)\n  }\n": types.DeleteEventHorizonDocument,
};

/**
 * The graphql function is used to parse GraphQL queries into a document that can be used by GraphQL clients.
 */
export function graphql(source: "\n  mutation SignIn($email: String!, $password: String!) {\n    signIn(email: $email, password: $password) {\n      token\n      user {\n        id\n        email\n        displayName\n      }\n    }\n  }\n"): typeof import('./graphql').SignInDocument;
/**
 * The graphql function is used to parse GraphQL queries into a document that can be used by GraphQL clients.
 */
export function graphql(source: "\n  query Me {\n    me {\n      id\n      email\n      displayName\n    }\n  }\n"): typeof import('./graphql').MeDocument;
/**
 * The graphql function is used to parse GraphQL queries into a document that can be used by GraphQL clients.
 */
export function graphql(source: "\n  query Calibrate($input: CalibrateInput!) {\n    calibrate(input: $input) {\n      curve\n      medianCalBp\n      meanCalBp\n      sdYears\n      hpd68 {\n        olderCalBp\n        youngerCalBp\n        probability\n      }\n      hpd95 {\n        olderCalBp\n        youngerCalBp\n        probability\n      }\n      density {\n        calBp\n        probability\n      }\n      warnings\n    }\n  }\n"): typeof import('./graphql').CalibrateDocument;
/**
 * The graphql function is used to parse GraphQL queries into a document that can be used by GraphQL clients.
 */
export function graphql(source: "\n  query CalibrationCurves {\n    calibrationCurves {\n      code\n      name\n      marine\n      builtIn\n      youngestCalBp\n      oldestCalBp\n    }\n  }\n"): typeof import('./graphql').CalibrationCurvesDocument;
/**
 * The graphql function is used to parse GraphQL queries into a document that can be used by GraphQL clients.
 */
export function graphql(source: "\n  query CalibrationCurveBand($curve: CurveCode!, $youngerCalBp: Int!, $olderCalBp: Int!) {\n    calibrationCurveBand(curve: $curve, youngerCalBp: $youngerCalBp, olderCalBp: $olderCalBp) {\n      calBp\n      c14Age\n      c14Sigma\n    }\n  }\n"): typeof import('./graphql').CalibrationCurveBandDocument;
/**
 * The graphql function is used to parse GraphQL queries into a document that can be used by GraphQL clients.
 */
export function graphql(source: "\n  query SiteCalibrations($id: ID!) {\n    site(id: $id) {\n      id\n      samples {\n        id\n        labCode\n        method\n        c14Age\n        c14Error\n        curve\n        deltaR\n        deltaRError\n        excluded\n        unit {\n          id\n          name\n          position\n        }\n        calibration {\n          curve\n          medianCalBp\n          hpd68 {\n            olderCalBp\n            youngerCalBp\n            probability\n          }\n          hpd95 {\n            olderCalBp\n            youngerCalBp\n            probability\n          }\n          density {\n            calBp\n            probability\n          }\n          warnings\n        }\n      }\n    }\n  }\n"): typeof import('./graphql').SiteCalibrationsDocument;
/**
 * The graphql function is used to parse GraphQL queries into a document that can be used by GraphQL clients.
 */
export function graphql(source: "\n  mutation ImportSamples($input: ImportSamplesInput!) {\n    importSamples(input: $input) {\n      rowCount\n      committed\n      errors {\n        row\n        field\n        message\n      }\n      preview {\n        row\n        labCode\n        unitName\n        medianCalBp\n        hpd95 {\n          olderCalBp\n          youngerCalBp\n          probability\n        }\n        warnings\n      }\n    }\n  }\n"): typeof import('./graphql').ImportSamplesDocument;
/**
 * The graphql function is used to parse GraphQL queries into a document that can be used by GraphQL clients.
 */
export function graphql(source: "\n  query Projects {\n    projects {\n      id\n      name\n      description\n      tectonicSetting\n      myRole\n    }\n  }\n"): typeof import('./graphql').ProjectsDocument;
/**
 * The graphql function is used to parse GraphQL queries into a document that can be used by GraphQL clients.
 */
export function graphql(source: "\n  query ProjectOverview($id: ID!) {\n    project(id: $id) {\n      id\n      name\n      description\n      tectonicSetting\n      myRole\n      segments {\n        id\n        version\n        name\n        startKm\n        endKm\n        notes\n      }\n      sites {\n        id\n        version\n        name\n        kind\n        latitude\n        longitude\n        alongStrikeKm\n        elevationM\n        waterDepthM\n        notes\n        segment {\n          id\n          name\n        }\n        eventHorizons {\n          id\n        }\n        samples {\n          id\n        }\n      }\n    }\n  }\n"): typeof import('./graphql').ProjectOverviewDocument;
/**
 * The graphql function is used to parse GraphQL queries into a document that can be used by GraphQL clients.
 */
export function graphql(source: "\n  mutation CreateSegment($input: CreateSegmentInput!) {\n    createSegment(input: $input) {\n      id\n    }\n  }\n"): typeof import('./graphql').CreateSegmentDocument;
/**
 * The graphql function is used to parse GraphQL queries into a document that can be used by GraphQL clients.
 */
export function graphql(source: "\n  mutation UpdateSegment($id: ID!, $version: Int!, $input: UpdateSegmentInput!) {\n    updateSegment(id: $id, version: $version, input: $input) {\n      id\n      version\n    }\n  }\n"): typeof import('./graphql').UpdateSegmentDocument;
/**
 * The graphql function is used to parse GraphQL queries into a document that can be used by GraphQL clients.
 */
export function graphql(source: "\n  mutation DeleteSegment($id: ID!) {\n    deleteSegment(id: $id)\n  }\n"): typeof import('./graphql').DeleteSegmentDocument;
/**
 * The graphql function is used to parse GraphQL queries into a document that can be used by GraphQL clients.
 */
export function graphql(source: "\n  mutation CreateSite($input: CreateSiteInput!) {\n    createSite(input: $input) {\n      id\n    }\n  }\n"): typeof import('./graphql').CreateSiteDocument;
/**
 * The graphql function is used to parse GraphQL queries into a document that can be used by GraphQL clients.
 */
export function graphql(source: "\n  mutation UpdateSite($id: ID!, $version: Int!, $input: UpdateSiteInput!) {\n    updateSite(id: $id, version: $version, input: $input) {\n      id\n      version\n    }\n  }\n"): typeof import('./graphql').UpdateSiteDocument;
/**
 * The graphql function is used to parse GraphQL queries into a document that can be used by GraphQL clients.
 */
export function graphql(source: "\n  mutation DeleteSite($id: ID!) {\n    deleteSite(id: $id)\n  }\n"): typeof import('./graphql').DeleteSiteDocument;
/**
 * The graphql function is used to parse GraphQL queries into a document that can be used by GraphQL clients.
 */
export function graphql(source: "\n  mutation CreateSample($input: CreateSampleInput!) {\n    createSample(input: $input) {\n      id\n    }\n  }\n"): typeof import('./graphql').CreateSampleDocument;
/**
 * The graphql function is used to parse GraphQL queries into a document that can be used by GraphQL clients.
 */
export function graphql(source: "\n  mutation UpdateSample($id: ID!, $version: Int!, $input: UpdateSampleInput!) {\n    updateSample(id: $id, version: $version, input: $input) {\n      id\n      version\n    }\n  }\n"): typeof import('./graphql').UpdateSampleDocument;
/**
 * The graphql function is used to parse GraphQL queries into a document that can be used by GraphQL clients.
 */
export function graphql(source: "\n  mutation DeleteSample($id: ID!) {\n    deleteSample(id: $id)\n  }\n"): typeof import('./graphql').DeleteSampleDocument;
/**
 * The graphql function is used to parse GraphQL queries into a document that can be used by GraphQL clients.
 */
export function graphql(source: "\n  query Site($id: ID!) {\n    site(id: $id) {\n      id\n      version\n      name\n      kind\n      latitude\n      longitude\n      alongStrikeKm\n      elevationM\n      waterDepthM\n      notes\n      project {\n        id\n        name\n        myRole\n      }\n      segment {\n        id\n        name\n      }\n      units {\n        id\n        version\n        position\n        name\n        topDepthM\n        baseDepthM\n        facies\n        notes\n      }\n      eventHorizons {\n        id\n        version\n        name\n        quality\n        evidence\n        notes\n        unitBelow {\n          id\n        }\n        unitAbove {\n          id\n        }\n      }\n      samples {\n        id\n        version\n        labCode\n        method\n        material\n        depthM\n        ageRelation\n        c14Age\n        c14Error\n        delta13C\n        curve\n        deltaR\n        deltaRError\n        calendarAgeBp\n        calendarErrorYears\n        measurementYear\n        excluded\n        exclusionReason\n        notes\n        unit {\n          id\n        }\n        calibrationError\n        calibration {\n          curve\n          medianCalBp\n          meanCalBp\n          sdYears\n          hpd68 {\n            olderCalBp\n            youngerCalBp\n            probability\n          }\n          hpd95 {\n            olderCalBp\n            youngerCalBp\n            probability\n          }\n          warnings\n        }\n      }\n    }\n  }\n"): typeof import('./graphql').SiteDocument;
/**
 * The graphql function is used to parse GraphQL queries into a document that can be used by GraphQL clients.
 */
export function graphql(source: "\n  mutation CreateUnit($input: CreateUnitInput!) {\n    createUnit(input: $input) {\n      id\n    }\n  }\n"): typeof import('./graphql').CreateUnitDocument;
/**
 * The graphql function is used to parse GraphQL queries into a document that can be used by GraphQL clients.
 */
export function graphql(source: "\n  mutation UpdateUnit($id: ID!, $version: Int!, $input: UpdateUnitInput!) {\n    updateUnit(id: $id, version: $version, input: $input) {\n      id\n      version\n    }\n  }\n"): typeof import('./graphql').UpdateUnitDocument;
/**
 * The graphql function is used to parse GraphQL queries into a document that can be used by GraphQL clients.
 */
export function graphql(source: "\n  mutation DeleteUnit($id: ID!) {\n    deleteUnit(id: $id)\n  }\n"): typeof import('./graphql').DeleteUnitDocument;
/**
 * The graphql function is used to parse GraphQL queries into a document that can be used by GraphQL clients.
 */
export function graphql(source: "\n  mutation CreateEventHorizon($input: CreateEventHorizonInput!) {\n    createEventHorizon(input: $input) {\n      id\n    }\n  }\n"): typeof import('./graphql').CreateEventHorizonDocument;
/**
 * The graphql function is used to parse GraphQL queries into a document that can be used by GraphQL clients.
 */
export function graphql(source: "\n  mutation UpdateEventHorizon($id: ID!, $version: Int!, $input: UpdateEventHorizonInput!) {\n    updateEventHorizon(id: $id, version: $version, input: $input) {\n      id\n      version\n    }\n  }\n"): typeof import('./graphql').UpdateEventHorizonDocument;
/**
 * The graphql function is used to parse GraphQL queries into a document that can be used by GraphQL clients.
 */
export function graphql(source: "\n  mutation DeleteEventHorizon($id: ID!) {\n    deleteEventHorizon(id: $id)\n  }\n"): typeof import('./graphql').DeleteEventHorizonDocument;


export function graphql(source: string) {
  return (documents as any)[source] ?? {};
}
