import { graphql } from '@/gql';

export const CalibrateDocument = graphql(`
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
`);

export const CalibrationCurvesDocument = graphql(`
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
`);

export const CalibrationCurveBandDocument = graphql(`
  query CalibrationCurveBand($curve: CurveCode!, $youngerCalBp: Int!, $olderCalBp: Int!) {
    calibrationCurveBand(curve: $curve, youngerCalBp: $youngerCalBp, olderCalBp: $olderCalBp) {
      calBp
      c14Age
      c14Sigma
    }
  }
`);

export const SiteCalibrationsDocument = graphql(`
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
`);
