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
    "\n  query AgeModelRun($id: ID!) {\n    ageModelRun(id: $id) {\n      id\n      status\n      progress\n      message\n      seed\n      settings\n      stale\n      createdAt\n      finishedAt\n      diagnostics {\n        converged\n        maxRhat\n        minEss\n        message\n      }\n      events {\n        medianCalBp\n        meanCalBp\n        rhat\n        ess\n        eventHorizon {\n          id\n          name\n        }\n        hpd68 {\n          ...HpdRangeFields\n        }\n        hpd95 {\n          ...HpdRangeFields\n        }\n        density {\n          calBp\n          probability\n        }\n      }\n      samples {\n        outlierProbability\n        medianCalBp\n        sample {\n          id\n          labCode\n        }\n        hpd95 {\n          ...HpdRangeFields\n        }\n      }\n    }\n  }\n": typeof types.AgeModelRunDocument,
    "\n  query AgeModelSite($id: ID!) {\n    site(id: $id) {\n      id\n      name\n      kind\n      project {\n        id\n        name\n        myRole\n        myPermissions\n      }\n      units {\n        id\n        position\n        name\n      }\n      eventHorizons {\n        id\n        name\n        quality\n        unitBelow {\n          id\n          position\n        }\n        unitAbove {\n          id\n          position\n        }\n      }\n      samples {\n        id\n        labCode\n        method\n        material\n        ageRelation\n        excluded\n        unit {\n          id\n          position\n        }\n        depthM\n        calibrationError\n        calibration {\n          medianCalBp\n          density {\n            calBp\n            probability\n          }\n        }\n      }\n      latestAgeModelRun {\n        id\n        status\n        stale\n      }\n    }\n  }\n": typeof types.AgeModelSiteDocument,
    "\n  mutation StartAgeModelRun($input: StartAgeModelRunInput!) {\n    startAgeModelRun(input: $input) {\n      id\n      status\n    }\n  }\n": typeof types.StartAgeModelRunDocument,
    "\n  mutation CancelAgeModelRun($id: ID!) {\n    cancelAgeModelRun(id: $id) {\n      id\n      status\n    }\n  }\n": typeof types.CancelAgeModelRunDocument,
    "\n  fragment HpdRangeFields on HpdRange {\n    olderCalBp\n    youngerCalBp\n    probability\n  }\n": typeof types.HpdRangeFieldsFragmentDoc,
    "\n  query SiteAttachments($id: ID!) {\n    site(id: $id) {\n      id\n      project {\n        id\n        myRole\n        myPermissions\n      }\n      attachments {\n        id\n        fileName\n        contentType\n        sizeBytes\n        createdAt\n        url\n        thumbnailUrl\n      }\n      samples {\n        id\n        labCode\n        attachments {\n          id\n          fileName\n          contentType\n          sizeBytes\n          createdAt\n          url\n          thumbnailUrl\n        }\n      }\n    }\n  }\n": typeof types.SiteAttachmentsDocument,
    "\n  mutation DeleteAttachment($id: ID!) {\n    deleteAttachment(id: $id)\n  }\n": typeof types.DeleteAttachmentDocument,
    "\n  query AuditTrail($input: AuditTrailInput!) {\n    auditTrail(input: $input) {\n      edges {\n        cursor\n        node {\n          id\n          at\n          actor {\n            id\n            email\n            displayName\n          }\n          action\n          objectType\n          objectId\n          objectName\n          referencedNames {\n            id\n            name\n          }\n          before\n          after\n        }\n      }\n      pageInfo {\n        endCursor\n        hasNextPage\n      }\n    }\n  }\n": typeof types.AuditTrailDocument,
    "\n  mutation SignIn($email: String!, $password: String!) {\n    signIn(email: $email, password: $password) {\n      token\n      user {\n        id\n        email\n        displayName\n      }\n    }\n  }\n": typeof types.SignInDocument,
    "\n  query Me {\n    me {\n      id\n      email\n      displayName\n    }\n  }\n": typeof types.MeDocument,
    "\n  query Calibrate($input: CalibrateInput!) {\n    calibrate(input: $input) {\n      curve\n      medianCalBp\n      meanCalBp\n      sdYears\n      hpd68 {\n        ...HpdRangeFields\n      }\n      hpd95 {\n        ...HpdRangeFields\n      }\n      density {\n        calBp\n        probability\n      }\n      warnings\n    }\n  }\n": typeof types.CalibrateDocument,
    "\n  query CalibrationCurves {\n    calibrationCurves {\n      code\n      name\n      marine\n      builtIn\n      youngestCalBp\n      oldestCalBp\n    }\n  }\n": typeof types.CalibrationCurvesDocument,
    "\n  query CalibrationCurveBand($curve: CurveCode!, $youngerCalBp: Int!, $olderCalBp: Int!) {\n    calibrationCurveBand(curve: $curve, youngerCalBp: $youngerCalBp, olderCalBp: $olderCalBp) {\n      calBp\n      c14Age\n      c14Sigma\n    }\n  }\n": typeof types.CalibrationCurveBandDocument,
    "\n  query SiteCalibrations($id: ID!) {\n    site(id: $id) {\n      id\n      samples {\n        id\n        labCode\n        method\n        c14Age\n        c14Error\n        curve\n        deltaR\n        deltaRError\n        excluded\n        unit {\n          id\n          name\n          position\n        }\n        calibration {\n          curve\n          medianCalBp\n          meanCalBp\n          sdYears\n          hpd68 {\n            ...HpdRangeFields\n          }\n          hpd95 {\n            ...HpdRangeFields\n          }\n          density {\n            calBp\n            probability\n          }\n          warnings\n        }\n      }\n    }\n  }\n": typeof types.SiteCalibrationsDocument,
    "\n  query SiteCoreLogs($id: ID!) {\n    site(id: $id) {\n      id\n      units {\n        id\n        topDepthM\n        baseDepthM\n        facies\n      }\n      coreLogs {\n        id\n        name\n        channels\n        units\n        topDepthM\n        baseDepthM\n        rowCount\n        traces(maxPoints: 300) {\n          channel\n          unit\n          depthsM\n          values\n        }\n      }\n    }\n  }\n": typeof types.SiteCoreLogsDocument,
    "\n  mutation UploadCoreLog($input: UploadCoreLogInput!) {\n    uploadCoreLog(input: $input) {\n      id\n      channels\n    }\n  }\n": typeof types.UploadCoreLogDocument,
    "\n  mutation DeleteCoreLog($id: ID!) {\n    deleteCoreLog(id: $id)\n  }\n": typeof types.DeleteCoreLogDocument,
    "\n  query EventLadder($projectId: ID!) {\n    eventLadder(projectId: $projectId) {\n      columns {\n        site {\n          id\n          name\n          kind\n          alongStrikeKm\n          segment {\n            id\n            name\n          }\n        }\n        latestAgeModelRun {\n          id\n          stale\n        }\n        events {\n          medianCalBp\n          eventHorizon {\n            id\n            name\n            quality\n          }\n          hpd95 {\n            olderCalBp\n            youngerCalBp\n            probability\n          }\n          densityGrid {\n            startCalBp\n            stepYears\n            values\n          }\n        }\n      }\n    }\n    project(id: $projectId) {\n      id\n      name\n      myRole\n      myPermissions\n      tectonicSetting\n      hypotheses {\n        id\n        name\n        preferred\n        version\n      }\n    }\n  }\n": typeof types.EventLadderDocument,
    "\n  query Hypothesis($id: ID!) {\n    hypothesis(id: $id) {\n      id\n      name\n      description\n      preferred\n      version\n      author {\n        id\n        displayName\n      }\n      copiedFrom {\n        id\n        name\n      }\n      ties {\n        id\n        confidence\n        evidence\n        note\n        eventA {\n          id\n          name\n        }\n        eventB {\n          id\n          name\n        }\n      }\n      regionalEvents {\n        id\n        combinedMedianCalBp\n        concordance\n        concordanceThreshold\n        concordanceLow\n        warnings\n        ruptureLengthKm\n        members {\n          id\n          name\n        }\n        combinedHpd95 {\n          olderCalBp\n          youngerCalBp\n          probability\n        }\n        chiSquare {\n          t\n          df\n          critical5\n          passes\n        }\n        magnitude {\n          mw\n          sigma\n          relation\n        }\n      }\n      orderConflicts {\n        message\n        tieA {\n          id\n        }\n        tieB {\n          id\n        }\n        ties {\n          id\n        }\n        regionalEventIds\n      }\n    }\n  }\n": typeof types.HypothesisDocument,
    "\n  mutation AddTie($input: AddTieInput!) {\n    addTie(input: $input) {\n      id\n    }\n  }\n": typeof types.AddTieDocument,
    "\n  mutation RemoveTie($id: ID!) {\n    removeTie(id: $id)\n  }\n": typeof types.RemoveTieDocument,
    "\n  mutation CreateHypothesis($input: CreateHypothesisInput!) {\n    createHypothesis(input: $input) {\n      id\n      name\n    }\n  }\n": typeof types.CreateHypothesisDocument,
    "\n  mutation SetPreferredHypothesis($id: ID!) {\n    setPreferredHypothesis(id: $id) {\n      id\n      preferred\n    }\n  }\n": typeof types.SetPreferredHypothesisDocument,
    "\n  mutation ImportSamples($input: ImportSamplesInput!) {\n    importSamples(input: $input) {\n      rowCount\n      committed\n      errors {\n        row\n        field\n        message\n      }\n      preview {\n        row\n        labCode\n        unitName\n        medianCalBp\n        hpd95 {\n          ...HpdRangeFields\n        }\n        warnings\n      }\n    }\n  }\n": typeof types.ImportSamplesDocument,
    "\n  query Projects {\n    projects {\n      id\n      name\n      description\n      tectonicSetting\n      myRole\n      myPermissions\n    }\n  }\n": typeof types.ProjectsDocument,
    "\n  query ProjectOverview($id: ID!) {\n    project(id: $id) {\n      id\n      name\n      description\n      tectonicSetting\n      myRole\n      myPermissions\n      segments {\n        id\n        version\n        name\n        startKm\n        endKm\n        notes\n      }\n      sites {\n        id\n        version\n        name\n        kind\n        latitude\n        longitude\n        alongStrikeKm\n        elevationM\n        waterDepthM\n        notes\n        segment {\n          id\n          name\n        }\n        eventHorizons {\n          id\n        }\n        samples {\n          id\n        }\n      }\n    }\n  }\n": typeof types.ProjectOverviewDocument,
    "\n  mutation CreateSegment($input: CreateSegmentInput!) {\n    createSegment(input: $input) {\n      id\n    }\n  }\n": typeof types.CreateSegmentDocument,
    "\n  mutation UpdateSegment($id: ID!, $version: Int!, $input: UpdateSegmentInput!) {\n    updateSegment(id: $id, version: $version, input: $input) {\n      id\n      version\n    }\n  }\n": typeof types.UpdateSegmentDocument,
    "\n  mutation DeleteSegment($id: ID!) {\n    deleteSegment(id: $id)\n  }\n": typeof types.DeleteSegmentDocument,
    "\n  mutation CreateSite($input: CreateSiteInput!) {\n    createSite(input: $input) {\n      id\n    }\n  }\n": typeof types.CreateSiteDocument,
    "\n  mutation UpdateSite($id: ID!, $version: Int!, $input: UpdateSiteInput!) {\n    updateSite(id: $id, version: $version, input: $input) {\n      id\n      version\n    }\n  }\n": typeof types.UpdateSiteDocument,
    "\n  mutation DeleteSite($id: ID!) {\n    deleteSite(id: $id)\n  }\n": typeof types.DeleteSiteDocument,
    "\n  query RecurrenceSetup($projectId: ID!) {\n    project(id: $projectId) {\n      id\n      name\n      myRole\n      myPermissions\n      segments {\n        id\n        name\n      }\n      sites {\n        id\n        name\n        kind\n      }\n      hypotheses {\n        id\n        name\n        preferred\n      }\n      preferredHypothesis {\n        id\n      }\n      recurrenceAnalyses {\n        id\n        status\n        createdAt\n        forecastStartYear\n        draws\n        segment {\n          id\n          name\n        }\n        site {\n          id\n          name\n        }\n        hypothesis {\n          id\n          name\n        }\n      }\n    }\n  }\n": typeof types.RecurrenceSetupDocument,
    "\n  query RecurrenceAnalysis($id: ID!) {\n    recurrenceAnalysis(id: $id) {\n      id\n      status\n      progress\n      message\n      seed\n      forecastStartYear\n      windowsYears\n      draws\n      createdAt\n      finishedAt\n      hypothesisVersion\n      stale\n      staleReasons {\n        message\n        via\n      }\n      inputs {\n        ageModelRuns {\n          id\n          site {\n            id\n            name\n          }\n        }\n        hypothesisVersion\n      }\n      segment {\n        id\n        name\n      }\n      site {\n        id\n        name\n      }\n      hypothesis {\n        id\n        name\n      }\n      eventCount\n      lastEventMedianCalBp\n      openInterval {\n        median\n        low95\n        high95\n      }\n      intervals {\n        index\n        medianYears\n        low95\n        high95\n      }\n      meanRecurrence {\n        median\n        low95\n        high95\n      }\n      medianRecurrence {\n        median\n        low95\n        high95\n      }\n      sdRecurrence {\n        median\n        low95\n        high95\n      }\n      aperiodicity {\n        median\n        low95\n        high95\n      }\n      poisson {\n        windowYears\n        median\n        low95\n        high95\n      }\n      models {\n        model\n        aic\n        deltaAic\n        aicc\n        deltaAicc\n        akaikeWeight\n        meanRecurrenceYears\n        aperiodicity\n        logLikelihood\n        meanRecurrenceRange {\n          median\n          low95\n          high95\n          datingOnlyLow95\n          datingOnlyHigh95\n        }\n        aperiodicityRange {\n          median\n          low95\n          high95\n          datingOnlyLow95\n          datingOnlyHigh95\n        }\n        probabilities {\n          windowYears\n          median\n          low95\n          high95\n          datingOnlyLow95\n          datingOnlyHigh95\n        }\n      }\n      modelAveraged {\n        windowYears\n        median\n        low95\n        high95\n        datingOnlyLow95\n        datingOnlyHigh95\n      }\n      parameterNote\n      modelComparisonNote\n      curves {\n        model\n        density {\n          years\n          value\n        }\n        hazard {\n          years\n          value\n        }\n        survival {\n          years\n          value\n        }\n      }\n      histogram {\n        fromYears\n        toYears\n        count\n      }\n      caution\n    }\n  }\n": typeof types.RecurrenceAnalysisDocument,
    "\n  mutation StartRecurrenceAnalysis($input: StartRecurrenceAnalysisInput!) {\n    startRecurrenceAnalysis(input: $input) {\n      id\n      status\n    }\n  }\n": typeof types.StartRecurrenceAnalysisDocument,
    "\n  mutation CancelRecurrenceAnalysis($id: ID!) {\n    cancelRecurrenceAnalysis(id: $id) {\n      id\n      status\n    }\n  }\n": typeof types.CancelRecurrenceAnalysisDocument,
    "\n  mutation RefreshStaleResults($projectId: ID!) {\n    refreshStaleResults(projectId: $projectId) {\n      id\n    }\n  }\n": typeof types.RefreshStaleResultsDocument,
    "\n  query LatestRefresh($projectId: ID!) {\n    project(id: $projectId) {\n      id\n      refreshPlans {\n        id\n        status\n        createdAt\n        steps {\n          id\n          stage\n          label\n          status\n          message\n        }\n        skipped {\n          id\n          label\n          reason\n        }\n      }\n    }\n  }\n": typeof types.LatestRefreshDocument,
    "\n  query ProjectReleases($id: ID!) {\n    project(id: $id) {\n      id\n      myRole\n      myPermissions\n      releases {\n        id\n        number\n        note\n        createdAt\n        createdBy {\n          id\n          displayName\n          email\n        }\n      }\n    }\n  }\n": typeof types.ProjectReleasesDocument,
    "\n  query Release($id: ID!) {\n    release(id: $id) {\n      id\n      number\n      note\n      createdAt\n      createdBy {\n        id\n        displayName\n      }\n      segments {\n        id\n        name\n        startKm\n        endKm\n      }\n      sites {\n        id\n        name\n        kind\n        latitude\n        longitude\n        alongStrikeKm\n        segment {\n          id\n          name\n        }\n        units {\n          id\n        }\n        eventHorizons {\n          id\n        }\n        samples {\n          id\n        }\n      }\n    }\n  }\n": typeof types.ReleaseDocument,
    "\n  query ReleaseDiff($fromId: ID!, $toId: ID!) {\n    releaseDiff(fromId: $fromId, toId: $toId) {\n      from {\n        id\n        number\n      }\n      to {\n        id\n        number\n      }\n      changes {\n        objectType\n        objectId\n        label\n        change\n      }\n    }\n  }\n": typeof types.ReleaseDiffDocument,
    "\n  mutation CreateRelease($input: CreateReleaseInput!) {\n    createRelease(input: $input) {\n      id\n      number\n    }\n  }\n": typeof types.CreateReleaseDocument,
    "\n  mutation CreateSample($input: CreateSampleInput!) {\n    createSample(input: $input) {\n      id\n    }\n  }\n": typeof types.CreateSampleDocument,
    "\n  mutation UpdateSample($id: ID!, $version: Int!, $input: UpdateSampleInput!) {\n    updateSample(id: $id, version: $version, input: $input) {\n      id\n      version\n    }\n  }\n": typeof types.UpdateSampleDocument,
    "\n  mutation DeleteSample($id: ID!) {\n    deleteSample(id: $id)\n  }\n": typeof types.DeleteSampleDocument,
    "\n  query Site($id: ID!) {\n    site(id: $id) {\n      id\n      version\n      name\n      kind\n      latitude\n      longitude\n      alongStrikeKm\n      elevationM\n      waterDepthM\n      notes\n      project {\n        id\n        name\n        myRole\n        myPermissions\n      }\n      segment {\n        id\n        name\n      }\n      units {\n        id\n        version\n        position\n        name\n        topDepthM\n        baseDepthM\n        facies\n        basalErosionM\n        notes\n      }\n      eventHorizons {\n        id\n        version\n        name\n        quality\n        evidence\n        notes\n        unitBelow {\n          id\n        }\n        unitAbove {\n          id\n        }\n      }\n      samples {\n        id\n        version\n        labCode\n        method\n        material\n        depthM\n        ageRelation\n        c14Age\n        c14Error\n        delta13C\n        curve\n        deltaR\n        deltaRError\n        calendarAgeBp\n        calendarErrorYears\n        measurementYear\n        excluded\n        exclusionReason\n        notes\n        unit {\n          id\n        }\n        calibrationError\n        calibration {\n          curve\n          medianCalBp\n          meanCalBp\n          sdYears\n          hpd68 {\n            ...HpdRangeFields\n          }\n          hpd95 {\n            ...HpdRangeFields\n          }\n          warnings\n        }\n      }\n    }\n  }\n": typeof types.SiteDocument,
    "\n  mutation CreateUnit($input: CreateUnitInput!) {\n    createUnit(input: $input) {\n      id\n    }\n  }\n": typeof types.CreateUnitDocument,
    "\n  mutation UpdateUnit($id: ID!, $version: Int!, $input: UpdateUnitInput!) {\n    updateUnit(id: $id, version: $version, input: $input) {\n      id\n      version\n    }\n  }\n": typeof types.UpdateUnitDocument,
    "\n  mutation DeleteUnit($id: ID!) {\n    deleteUnit(id: $id)\n  }\n": typeof types.DeleteUnitDocument,
    "\n  mutation CreateEventHorizon($input: CreateEventHorizonInput!) {\n    createEventHorizon(input: $input) {\n      id\n    }\n  }\n": typeof types.CreateEventHorizonDocument,
    "\n  mutation UpdateEventHorizon($id: ID!, $version: Int!, $input: UpdateEventHorizonInput!) {\n    updateEventHorizon(id: $id, version: $version, input: $input) {\n      id\n      version\n    }\n  }\n": typeof types.UpdateEventHorizonDocument,
    "\n  mutation DeleteEventHorizon($id: ID!) {\n    deleteEventHorizon(id: $id)\n  }\n": typeof types.DeleteEventHorizonDocument,
    "\n  mutation AcceptInvitation($input: AcceptInvitationInput!) {\n    acceptInvitation(input: $input) {\n      token\n      user {\n        id\n        email\n        displayName\n      }\n    }\n  }\n": typeof types.AcceptInvitationDocument,
    "\n  mutation RequestPasswordReset($email: String!) {\n    requestPasswordReset(email: $email)\n  }\n": typeof types.RequestPasswordResetDocument,
    "\n  mutation ResetPassword($input: ResetPasswordInput!) {\n    resetPassword(input: $input)\n  }\n": typeof types.ResetPasswordDocument,
    "\n  query ProjectTeam($id: ID!) {\n    project(id: $id) {\n      id\n      name\n      myRole\n      myPermissions\n      members {\n        id\n        role\n        user {\n          id\n          email\n          displayName\n        }\n      }\n      invitations {\n        id\n        email\n        role\n        expiresAt\n        acceptedAt\n      }\n    }\n  }\n": typeof types.ProjectTeamDocument,
    "\n  mutation InviteMember($input: InviteMemberInput!) {\n    inviteMember(input: $input) {\n      id\n      email\n      role\n      expiresAt\n    }\n  }\n": typeof types.InviteMemberDocument,
    "\n  mutation SetMemberRole($input: SetMemberRoleInput!) {\n    setMemberRole(input: $input) {\n      id\n      role\n    }\n  }\n": typeof types.SetMemberRoleDocument,
    "\n  mutation RemoveMember($projectId: ID!, $userId: ID!) {\n    removeMember(projectId: $projectId, userId: $userId)\n  }\n": typeof types.RemoveMemberDocument,
    "\n  query InvitationLink($token: String!) {\n    invitationLink(token: $token) {\n      status\n      projectName\n    }\n  }\n": typeof types.InvitationLinkDocument,
};
const documents: Documents = {
    "\n  query AgeModelRun($id: ID!) {\n    ageModelRun(id: $id) {\n      id\n      status\n      progress\n      message\n      seed\n      settings\n      stale\n      createdAt\n      finishedAt\n      diagnostics {\n        converged\n        maxRhat\n        minEss\n        message\n      }\n      events {\n        medianCalBp\n        meanCalBp\n        rhat\n        ess\n        eventHorizon {\n          id\n          name\n        }\n        hpd68 {\n          ...HpdRangeFields\n        }\n        hpd95 {\n          ...HpdRangeFields\n        }\n        density {\n          calBp\n          probability\n        }\n      }\n      samples {\n        outlierProbability\n        medianCalBp\n        sample {\n          id\n          labCode\n        }\n        hpd95 {\n          ...HpdRangeFields\n        }\n      }\n    }\n  }\n": types.AgeModelRunDocument,
    "\n  query AgeModelSite($id: ID!) {\n    site(id: $id) {\n      id\n      name\n      kind\n      project {\n        id\n        name\n        myRole\n        myPermissions\n      }\n      units {\n        id\n        position\n        name\n      }\n      eventHorizons {\n        id\n        name\n        quality\n        unitBelow {\n          id\n          position\n        }\n        unitAbove {\n          id\n          position\n        }\n      }\n      samples {\n        id\n        labCode\n        method\n        material\n        ageRelation\n        excluded\n        unit {\n          id\n          position\n        }\n        depthM\n        calibrationError\n        calibration {\n          medianCalBp\n          density {\n            calBp\n            probability\n          }\n        }\n      }\n      latestAgeModelRun {\n        id\n        status\n        stale\n      }\n    }\n  }\n": types.AgeModelSiteDocument,
    "\n  mutation StartAgeModelRun($input: StartAgeModelRunInput!) {\n    startAgeModelRun(input: $input) {\n      id\n      status\n    }\n  }\n": types.StartAgeModelRunDocument,
    "\n  mutation CancelAgeModelRun($id: ID!) {\n    cancelAgeModelRun(id: $id) {\n      id\n      status\n    }\n  }\n": types.CancelAgeModelRunDocument,
    "\n  fragment HpdRangeFields on HpdRange {\n    olderCalBp\n    youngerCalBp\n    probability\n  }\n": types.HpdRangeFieldsFragmentDoc,
    "\n  query SiteAttachments($id: ID!) {\n    site(id: $id) {\n      id\n      project {\n        id\n        myRole\n        myPermissions\n      }\n      attachments {\n        id\n        fileName\n        contentType\n        sizeBytes\n        createdAt\n        url\n        thumbnailUrl\n      }\n      samples {\n        id\n        labCode\n        attachments {\n          id\n          fileName\n          contentType\n          sizeBytes\n          createdAt\n          url\n          thumbnailUrl\n        }\n      }\n    }\n  }\n": types.SiteAttachmentsDocument,
    "\n  mutation DeleteAttachment($id: ID!) {\n    deleteAttachment(id: $id)\n  }\n": types.DeleteAttachmentDocument,
    "\n  query AuditTrail($input: AuditTrailInput!) {\n    auditTrail(input: $input) {\n      edges {\n        cursor\n        node {\n          id\n          at\n          actor {\n            id\n            email\n            displayName\n          }\n          action\n          objectType\n          objectId\n          objectName\n          referencedNames {\n            id\n            name\n          }\n          before\n          after\n        }\n      }\n      pageInfo {\n        endCursor\n        hasNextPage\n      }\n    }\n  }\n": types.AuditTrailDocument,
    "\n  mutation SignIn($email: String!, $password: String!) {\n    signIn(email: $email, password: $password) {\n      token\n      user {\n        id\n        email\n        displayName\n      }\n    }\n  }\n": types.SignInDocument,
    "\n  query Me {\n    me {\n      id\n      email\n      displayName\n    }\n  }\n": types.MeDocument,
    "\n  query Calibrate($input: CalibrateInput!) {\n    calibrate(input: $input) {\n      curve\n      medianCalBp\n      meanCalBp\n      sdYears\n      hpd68 {\n        ...HpdRangeFields\n      }\n      hpd95 {\n        ...HpdRangeFields\n      }\n      density {\n        calBp\n        probability\n      }\n      warnings\n    }\n  }\n": types.CalibrateDocument,
    "\n  query CalibrationCurves {\n    calibrationCurves {\n      code\n      name\n      marine\n      builtIn\n      youngestCalBp\n      oldestCalBp\n    }\n  }\n": types.CalibrationCurvesDocument,
    "\n  query CalibrationCurveBand($curve: CurveCode!, $youngerCalBp: Int!, $olderCalBp: Int!) {\n    calibrationCurveBand(curve: $curve, youngerCalBp: $youngerCalBp, olderCalBp: $olderCalBp) {\n      calBp\n      c14Age\n      c14Sigma\n    }\n  }\n": types.CalibrationCurveBandDocument,
    "\n  query SiteCalibrations($id: ID!) {\n    site(id: $id) {\n      id\n      samples {\n        id\n        labCode\n        method\n        c14Age\n        c14Error\n        curve\n        deltaR\n        deltaRError\n        excluded\n        unit {\n          id\n          name\n          position\n        }\n        calibration {\n          curve\n          medianCalBp\n          meanCalBp\n          sdYears\n          hpd68 {\n            ...HpdRangeFields\n          }\n          hpd95 {\n            ...HpdRangeFields\n          }\n          density {\n            calBp\n            probability\n          }\n          warnings\n        }\n      }\n    }\n  }\n": types.SiteCalibrationsDocument,
    "\n  query SiteCoreLogs($id: ID!) {\n    site(id: $id) {\n      id\n      units {\n        id\n        topDepthM\n        baseDepthM\n        facies\n      }\n      coreLogs {\n        id\n        name\n        channels\n        units\n        topDepthM\n        baseDepthM\n        rowCount\n        traces(maxPoints: 300) {\n          channel\n          unit\n          depthsM\n          values\n        }\n      }\n    }\n  }\n": types.SiteCoreLogsDocument,
    "\n  mutation UploadCoreLog($input: UploadCoreLogInput!) {\n    uploadCoreLog(input: $input) {\n      id\n      channels\n    }\n  }\n": types.UploadCoreLogDocument,
    "\n  mutation DeleteCoreLog($id: ID!) {\n    deleteCoreLog(id: $id)\n  }\n": types.DeleteCoreLogDocument,
    "\n  query EventLadder($projectId: ID!) {\n    eventLadder(projectId: $projectId) {\n      columns {\n        site {\n          id\n          name\n          kind\n          alongStrikeKm\n          segment {\n            id\n            name\n          }\n        }\n        latestAgeModelRun {\n          id\n          stale\n        }\n        events {\n          medianCalBp\n          eventHorizon {\n            id\n            name\n            quality\n          }\n          hpd95 {\n            olderCalBp\n            youngerCalBp\n            probability\n          }\n          densityGrid {\n            startCalBp\n            stepYears\n            values\n          }\n        }\n      }\n    }\n    project(id: $projectId) {\n      id\n      name\n      myRole\n      myPermissions\n      tectonicSetting\n      hypotheses {\n        id\n        name\n        preferred\n        version\n      }\n    }\n  }\n": types.EventLadderDocument,
    "\n  query Hypothesis($id: ID!) {\n    hypothesis(id: $id) {\n      id\n      name\n      description\n      preferred\n      version\n      author {\n        id\n        displayName\n      }\n      copiedFrom {\n        id\n        name\n      }\n      ties {\n        id\n        confidence\n        evidence\n        note\n        eventA {\n          id\n          name\n        }\n        eventB {\n          id\n          name\n        }\n      }\n      regionalEvents {\n        id\n        combinedMedianCalBp\n        concordance\n        concordanceThreshold\n        concordanceLow\n        warnings\n        ruptureLengthKm\n        members {\n          id\n          name\n        }\n        combinedHpd95 {\n          olderCalBp\n          youngerCalBp\n          probability\n        }\n        chiSquare {\n          t\n          df\n          critical5\n          passes\n        }\n        magnitude {\n          mw\n          sigma\n          relation\n        }\n      }\n      orderConflicts {\n        message\n        tieA {\n          id\n        }\n        tieB {\n          id\n        }\n        ties {\n          id\n        }\n        regionalEventIds\n      }\n    }\n  }\n": types.HypothesisDocument,
    "\n  mutation AddTie($input: AddTieInput!) {\n    addTie(input: $input) {\n      id\n    }\n  }\n": types.AddTieDocument,
    "\n  mutation RemoveTie($id: ID!) {\n    removeTie(id: $id)\n  }\n": types.RemoveTieDocument,
    "\n  mutation CreateHypothesis($input: CreateHypothesisInput!) {\n    createHypothesis(input: $input) {\n      id\n      name\n    }\n  }\n": types.CreateHypothesisDocument,
    "\n  mutation SetPreferredHypothesis($id: ID!) {\n    setPreferredHypothesis(id: $id) {\n      id\n      preferred\n    }\n  }\n": types.SetPreferredHypothesisDocument,
    "\n  mutation ImportSamples($input: ImportSamplesInput!) {\n    importSamples(input: $input) {\n      rowCount\n      committed\n      errors {\n        row\n        field\n        message\n      }\n      preview {\n        row\n        labCode\n        unitName\n        medianCalBp\n        hpd95 {\n          ...HpdRangeFields\n        }\n        warnings\n      }\n    }\n  }\n": types.ImportSamplesDocument,
    "\n  query Projects {\n    projects {\n      id\n      name\n      description\n      tectonicSetting\n      myRole\n      myPermissions\n    }\n  }\n": types.ProjectsDocument,
    "\n  query ProjectOverview($id: ID!) {\n    project(id: $id) {\n      id\n      name\n      description\n      tectonicSetting\n      myRole\n      myPermissions\n      segments {\n        id\n        version\n        name\n        startKm\n        endKm\n        notes\n      }\n      sites {\n        id\n        version\n        name\n        kind\n        latitude\n        longitude\n        alongStrikeKm\n        elevationM\n        waterDepthM\n        notes\n        segment {\n          id\n          name\n        }\n        eventHorizons {\n          id\n        }\n        samples {\n          id\n        }\n      }\n    }\n  }\n": types.ProjectOverviewDocument,
    "\n  mutation CreateSegment($input: CreateSegmentInput!) {\n    createSegment(input: $input) {\n      id\n    }\n  }\n": types.CreateSegmentDocument,
    "\n  mutation UpdateSegment($id: ID!, $version: Int!, $input: UpdateSegmentInput!) {\n    updateSegment(id: $id, version: $version, input: $input) {\n      id\n      version\n    }\n  }\n": types.UpdateSegmentDocument,
    "\n  mutation DeleteSegment($id: ID!) {\n    deleteSegment(id: $id)\n  }\n": types.DeleteSegmentDocument,
    "\n  mutation CreateSite($input: CreateSiteInput!) {\n    createSite(input: $input) {\n      id\n    }\n  }\n": types.CreateSiteDocument,
    "\n  mutation UpdateSite($id: ID!, $version: Int!, $input: UpdateSiteInput!) {\n    updateSite(id: $id, version: $version, input: $input) {\n      id\n      version\n    }\n  }\n": types.UpdateSiteDocument,
    "\n  mutation DeleteSite($id: ID!) {\n    deleteSite(id: $id)\n  }\n": types.DeleteSiteDocument,
    "\n  query RecurrenceSetup($projectId: ID!) {\n    project(id: $projectId) {\n      id\n      name\n      myRole\n      myPermissions\n      segments {\n        id\n        name\n      }\n      sites {\n        id\n        name\n        kind\n      }\n      hypotheses {\n        id\n        name\n        preferred\n      }\n      preferredHypothesis {\n        id\n      }\n      recurrenceAnalyses {\n        id\n        status\n        createdAt\n        forecastStartYear\n        draws\n        segment {\n          id\n          name\n        }\n        site {\n          id\n          name\n        }\n        hypothesis {\n          id\n          name\n        }\n      }\n    }\n  }\n": types.RecurrenceSetupDocument,
    "\n  query RecurrenceAnalysis($id: ID!) {\n    recurrenceAnalysis(id: $id) {\n      id\n      status\n      progress\n      message\n      seed\n      forecastStartYear\n      windowsYears\n      draws\n      createdAt\n      finishedAt\n      hypothesisVersion\n      stale\n      staleReasons {\n        message\n        via\n      }\n      inputs {\n        ageModelRuns {\n          id\n          site {\n            id\n            name\n          }\n        }\n        hypothesisVersion\n      }\n      segment {\n        id\n        name\n      }\n      site {\n        id\n        name\n      }\n      hypothesis {\n        id\n        name\n      }\n      eventCount\n      lastEventMedianCalBp\n      openInterval {\n        median\n        low95\n        high95\n      }\n      intervals {\n        index\n        medianYears\n        low95\n        high95\n      }\n      meanRecurrence {\n        median\n        low95\n        high95\n      }\n      medianRecurrence {\n        median\n        low95\n        high95\n      }\n      sdRecurrence {\n        median\n        low95\n        high95\n      }\n      aperiodicity {\n        median\n        low95\n        high95\n      }\n      poisson {\n        windowYears\n        median\n        low95\n        high95\n      }\n      models {\n        model\n        aic\n        deltaAic\n        aicc\n        deltaAicc\n        akaikeWeight\n        meanRecurrenceYears\n        aperiodicity\n        logLikelihood\n        meanRecurrenceRange {\n          median\n          low95\n          high95\n          datingOnlyLow95\n          datingOnlyHigh95\n        }\n        aperiodicityRange {\n          median\n          low95\n          high95\n          datingOnlyLow95\n          datingOnlyHigh95\n        }\n        probabilities {\n          windowYears\n          median\n          low95\n          high95\n          datingOnlyLow95\n          datingOnlyHigh95\n        }\n      }\n      modelAveraged {\n        windowYears\n        median\n        low95\n        high95\n        datingOnlyLow95\n        datingOnlyHigh95\n      }\n      parameterNote\n      modelComparisonNote\n      curves {\n        model\n        density {\n          years\n          value\n        }\n        hazard {\n          years\n          value\n        }\n        survival {\n          years\n          value\n        }\n      }\n      histogram {\n        fromYears\n        toYears\n        count\n      }\n      caution\n    }\n  }\n": types.RecurrenceAnalysisDocument,
    "\n  mutation StartRecurrenceAnalysis($input: StartRecurrenceAnalysisInput!) {\n    startRecurrenceAnalysis(input: $input) {\n      id\n      status\n    }\n  }\n": types.StartRecurrenceAnalysisDocument,
    "\n  mutation CancelRecurrenceAnalysis($id: ID!) {\n    cancelRecurrenceAnalysis(id: $id) {\n      id\n      status\n    }\n  }\n": types.CancelRecurrenceAnalysisDocument,
    "\n  mutation RefreshStaleResults($projectId: ID!) {\n    refreshStaleResults(projectId: $projectId) {\n      id\n    }\n  }\n": types.RefreshStaleResultsDocument,
    "\n  query LatestRefresh($projectId: ID!) {\n    project(id: $projectId) {\n      id\n      refreshPlans {\n        id\n        status\n        createdAt\n        steps {\n          id\n          stage\n          label\n          status\n          message\n        }\n        skipped {\n          id\n          label\n          reason\n        }\n      }\n    }\n  }\n": types.LatestRefreshDocument,
    "\n  query ProjectReleases($id: ID!) {\n    project(id: $id) {\n      id\n      myRole\n      myPermissions\n      releases {\n        id\n        number\n        note\n        createdAt\n        createdBy {\n          id\n          displayName\n          email\n        }\n      }\n    }\n  }\n": types.ProjectReleasesDocument,
    "\n  query Release($id: ID!) {\n    release(id: $id) {\n      id\n      number\n      note\n      createdAt\n      createdBy {\n        id\n        displayName\n      }\n      segments {\n        id\n        name\n        startKm\n        endKm\n      }\n      sites {\n        id\n        name\n        kind\n        latitude\n        longitude\n        alongStrikeKm\n        segment {\n          id\n          name\n        }\n        units {\n          id\n        }\n        eventHorizons {\n          id\n        }\n        samples {\n          id\n        }\n      }\n    }\n  }\n": types.ReleaseDocument,
    "\n  query ReleaseDiff($fromId: ID!, $toId: ID!) {\n    releaseDiff(fromId: $fromId, toId: $toId) {\n      from {\n        id\n        number\n      }\n      to {\n        id\n        number\n      }\n      changes {\n        objectType\n        objectId\n        label\n        change\n      }\n    }\n  }\n": types.ReleaseDiffDocument,
    "\n  mutation CreateRelease($input: CreateReleaseInput!) {\n    createRelease(input: $input) {\n      id\n      number\n    }\n  }\n": types.CreateReleaseDocument,
    "\n  mutation CreateSample($input: CreateSampleInput!) {\n    createSample(input: $input) {\n      id\n    }\n  }\n": types.CreateSampleDocument,
    "\n  mutation UpdateSample($id: ID!, $version: Int!, $input: UpdateSampleInput!) {\n    updateSample(id: $id, version: $version, input: $input) {\n      id\n      version\n    }\n  }\n": types.UpdateSampleDocument,
    "\n  mutation DeleteSample($id: ID!) {\n    deleteSample(id: $id)\n  }\n": types.DeleteSampleDocument,
    "\n  query Site($id: ID!) {\n    site(id: $id) {\n      id\n      version\n      name\n      kind\n      latitude\n      longitude\n      alongStrikeKm\n      elevationM\n      waterDepthM\n      notes\n      project {\n        id\n        name\n        myRole\n        myPermissions\n      }\n      segment {\n        id\n        name\n      }\n      units {\n        id\n        version\n        position\n        name\n        topDepthM\n        baseDepthM\n        facies\n        basalErosionM\n        notes\n      }\n      eventHorizons {\n        id\n        version\n        name\n        quality\n        evidence\n        notes\n        unitBelow {\n          id\n        }\n        unitAbove {\n          id\n        }\n      }\n      samples {\n        id\n        version\n        labCode\n        method\n        material\n        depthM\n        ageRelation\n        c14Age\n        c14Error\n        delta13C\n        curve\n        deltaR\n        deltaRError\n        calendarAgeBp\n        calendarErrorYears\n        measurementYear\n        excluded\n        exclusionReason\n        notes\n        unit {\n          id\n        }\n        calibrationError\n        calibration {\n          curve\n          medianCalBp\n          meanCalBp\n          sdYears\n          hpd68 {\n            ...HpdRangeFields\n          }\n          hpd95 {\n            ...HpdRangeFields\n          }\n          warnings\n        }\n      }\n    }\n  }\n": types.SiteDocument,
    "\n  mutation CreateUnit($input: CreateUnitInput!) {\n    createUnit(input: $input) {\n      id\n    }\n  }\n": types.CreateUnitDocument,
    "\n  mutation UpdateUnit($id: ID!, $version: Int!, $input: UpdateUnitInput!) {\n    updateUnit(id: $id, version: $version, input: $input) {\n      id\n      version\n    }\n  }\n": types.UpdateUnitDocument,
    "\n  mutation DeleteUnit($id: ID!) {\n    deleteUnit(id: $id)\n  }\n": types.DeleteUnitDocument,
    "\n  mutation CreateEventHorizon($input: CreateEventHorizonInput!) {\n    createEventHorizon(input: $input) {\n      id\n    }\n  }\n": types.CreateEventHorizonDocument,
    "\n  mutation UpdateEventHorizon($id: ID!, $version: Int!, $input: UpdateEventHorizonInput!) {\n    updateEventHorizon(id: $id, version: $version, input: $input) {\n      id\n      version\n    }\n  }\n": types.UpdateEventHorizonDocument,
    "\n  mutation DeleteEventHorizon($id: ID!) {\n    deleteEventHorizon(id: $id)\n  }\n": types.DeleteEventHorizonDocument,
    "\n  mutation AcceptInvitation($input: AcceptInvitationInput!) {\n    acceptInvitation(input: $input) {\n      token\n      user {\n        id\n        email\n        displayName\n      }\n    }\n  }\n": types.AcceptInvitationDocument,
    "\n  mutation RequestPasswordReset($email: String!) {\n    requestPasswordReset(email: $email)\n  }\n": types.RequestPasswordResetDocument,
    "\n  mutation ResetPassword($input: ResetPasswordInput!) {\n    resetPassword(input: $input)\n  }\n": types.ResetPasswordDocument,
    "\n  query ProjectTeam($id: ID!) {\n    project(id: $id) {\n      id\n      name\n      myRole\n      myPermissions\n      members {\n        id\n        role\n        user {\n          id\n          email\n          displayName\n        }\n      }\n      invitations {\n        id\n        email\n        role\n        expiresAt\n        acceptedAt\n      }\n    }\n  }\n": types.ProjectTeamDocument,
    "\n  mutation InviteMember($input: InviteMemberInput!) {\n    inviteMember(input: $input) {\n      id\n      email\n      role\n      expiresAt\n    }\n  }\n": types.InviteMemberDocument,
    "\n  mutation SetMemberRole($input: SetMemberRoleInput!) {\n    setMemberRole(input: $input) {\n      id\n      role\n    }\n  }\n": types.SetMemberRoleDocument,
    "\n  mutation RemoveMember($projectId: ID!, $userId: ID!) {\n    removeMember(projectId: $projectId, userId: $userId)\n  }\n": types.RemoveMemberDocument,
    "\n  query InvitationLink($token: String!) {\n    invitationLink(token: $token) {\n      status\n      projectName\n    }\n  }\n": types.InvitationLinkDocument,
};

/**
 * The graphql function is used to parse GraphQL queries into a document that can be used by GraphQL clients.
 */
export function graphql(source: "\n  query AgeModelRun($id: ID!) {\n    ageModelRun(id: $id) {\n      id\n      status\n      progress\n      message\n      seed\n      settings\n      stale\n      createdAt\n      finishedAt\n      diagnostics {\n        converged\n        maxRhat\n        minEss\n        message\n      }\n      events {\n        medianCalBp\n        meanCalBp\n        rhat\n        ess\n        eventHorizon {\n          id\n          name\n        }\n        hpd68 {\n          ...HpdRangeFields\n        }\n        hpd95 {\n          ...HpdRangeFields\n        }\n        density {\n          calBp\n          probability\n        }\n      }\n      samples {\n        outlierProbability\n        medianCalBp\n        sample {\n          id\n          labCode\n        }\n        hpd95 {\n          ...HpdRangeFields\n        }\n      }\n    }\n  }\n"): typeof import('./graphql').AgeModelRunDocument;
/**
 * The graphql function is used to parse GraphQL queries into a document that can be used by GraphQL clients.
 */
export function graphql(source: "\n  query AgeModelSite($id: ID!) {\n    site(id: $id) {\n      id\n      name\n      kind\n      project {\n        id\n        name\n        myRole\n        myPermissions\n      }\n      units {\n        id\n        position\n        name\n      }\n      eventHorizons {\n        id\n        name\n        quality\n        unitBelow {\n          id\n          position\n        }\n        unitAbove {\n          id\n          position\n        }\n      }\n      samples {\n        id\n        labCode\n        method\n        material\n        ageRelation\n        excluded\n        unit {\n          id\n          position\n        }\n        depthM\n        calibrationError\n        calibration {\n          medianCalBp\n          density {\n            calBp\n            probability\n          }\n        }\n      }\n      latestAgeModelRun {\n        id\n        status\n        stale\n      }\n    }\n  }\n"): typeof import('./graphql').AgeModelSiteDocument;
/**
 * The graphql function is used to parse GraphQL queries into a document that can be used by GraphQL clients.
 */
export function graphql(source: "\n  mutation StartAgeModelRun($input: StartAgeModelRunInput!) {\n    startAgeModelRun(input: $input) {\n      id\n      status\n    }\n  }\n"): typeof import('./graphql').StartAgeModelRunDocument;
/**
 * The graphql function is used to parse GraphQL queries into a document that can be used by GraphQL clients.
 */
export function graphql(source: "\n  mutation CancelAgeModelRun($id: ID!) {\n    cancelAgeModelRun(id: $id) {\n      id\n      status\n    }\n  }\n"): typeof import('./graphql').CancelAgeModelRunDocument;
/**
 * The graphql function is used to parse GraphQL queries into a document that can be used by GraphQL clients.
 */
export function graphql(source: "\n  fragment HpdRangeFields on HpdRange {\n    olderCalBp\n    youngerCalBp\n    probability\n  }\n"): typeof import('./graphql').HpdRangeFieldsFragmentDoc;
/**
 * The graphql function is used to parse GraphQL queries into a document that can be used by GraphQL clients.
 */
export function graphql(source: "\n  query SiteAttachments($id: ID!) {\n    site(id: $id) {\n      id\n      project {\n        id\n        myRole\n        myPermissions\n      }\n      attachments {\n        id\n        fileName\n        contentType\n        sizeBytes\n        createdAt\n        url\n        thumbnailUrl\n      }\n      samples {\n        id\n        labCode\n        attachments {\n          id\n          fileName\n          contentType\n          sizeBytes\n          createdAt\n          url\n          thumbnailUrl\n        }\n      }\n    }\n  }\n"): typeof import('./graphql').SiteAttachmentsDocument;
/**
 * The graphql function is used to parse GraphQL queries into a document that can be used by GraphQL clients.
 */
export function graphql(source: "\n  mutation DeleteAttachment($id: ID!) {\n    deleteAttachment(id: $id)\n  }\n"): typeof import('./graphql').DeleteAttachmentDocument;
/**
 * The graphql function is used to parse GraphQL queries into a document that can be used by GraphQL clients.
 */
export function graphql(source: "\n  query AuditTrail($input: AuditTrailInput!) {\n    auditTrail(input: $input) {\n      edges {\n        cursor\n        node {\n          id\n          at\n          actor {\n            id\n            email\n            displayName\n          }\n          action\n          objectType\n          objectId\n          objectName\n          referencedNames {\n            id\n            name\n          }\n          before\n          after\n        }\n      }\n      pageInfo {\n        endCursor\n        hasNextPage\n      }\n    }\n  }\n"): typeof import('./graphql').AuditTrailDocument;
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
export function graphql(source: "\n  query Calibrate($input: CalibrateInput!) {\n    calibrate(input: $input) {\n      curve\n      medianCalBp\n      meanCalBp\n      sdYears\n      hpd68 {\n        ...HpdRangeFields\n      }\n      hpd95 {\n        ...HpdRangeFields\n      }\n      density {\n        calBp\n        probability\n      }\n      warnings\n    }\n  }\n"): typeof import('./graphql').CalibrateDocument;
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
export function graphql(source: "\n  query SiteCalibrations($id: ID!) {\n    site(id: $id) {\n      id\n      samples {\n        id\n        labCode\n        method\n        c14Age\n        c14Error\n        curve\n        deltaR\n        deltaRError\n        excluded\n        unit {\n          id\n          name\n          position\n        }\n        calibration {\n          curve\n          medianCalBp\n          meanCalBp\n          sdYears\n          hpd68 {\n            ...HpdRangeFields\n          }\n          hpd95 {\n            ...HpdRangeFields\n          }\n          density {\n            calBp\n            probability\n          }\n          warnings\n        }\n      }\n    }\n  }\n"): typeof import('./graphql').SiteCalibrationsDocument;
/**
 * The graphql function is used to parse GraphQL queries into a document that can be used by GraphQL clients.
 */
export function graphql(source: "\n  query SiteCoreLogs($id: ID!) {\n    site(id: $id) {\n      id\n      units {\n        id\n        topDepthM\n        baseDepthM\n        facies\n      }\n      coreLogs {\n        id\n        name\n        channels\n        units\n        topDepthM\n        baseDepthM\n        rowCount\n        traces(maxPoints: 300) {\n          channel\n          unit\n          depthsM\n          values\n        }\n      }\n    }\n  }\n"): typeof import('./graphql').SiteCoreLogsDocument;
/**
 * The graphql function is used to parse GraphQL queries into a document that can be used by GraphQL clients.
 */
export function graphql(source: "\n  mutation UploadCoreLog($input: UploadCoreLogInput!) {\n    uploadCoreLog(input: $input) {\n      id\n      channels\n    }\n  }\n"): typeof import('./graphql').UploadCoreLogDocument;
/**
 * The graphql function is used to parse GraphQL queries into a document that can be used by GraphQL clients.
 */
export function graphql(source: "\n  mutation DeleteCoreLog($id: ID!) {\n    deleteCoreLog(id: $id)\n  }\n"): typeof import('./graphql').DeleteCoreLogDocument;
/**
 * The graphql function is used to parse GraphQL queries into a document that can be used by GraphQL clients.
 */
export function graphql(source: "\n  query EventLadder($projectId: ID!) {\n    eventLadder(projectId: $projectId) {\n      columns {\n        site {\n          id\n          name\n          kind\n          alongStrikeKm\n          segment {\n            id\n            name\n          }\n        }\n        latestAgeModelRun {\n          id\n          stale\n        }\n        events {\n          medianCalBp\n          eventHorizon {\n            id\n            name\n            quality\n          }\n          hpd95 {\n            olderCalBp\n            youngerCalBp\n            probability\n          }\n          densityGrid {\n            startCalBp\n            stepYears\n            values\n          }\n        }\n      }\n    }\n    project(id: $projectId) {\n      id\n      name\n      myRole\n      myPermissions\n      tectonicSetting\n      hypotheses {\n        id\n        name\n        preferred\n        version\n      }\n    }\n  }\n"): typeof import('./graphql').EventLadderDocument;
/**
 * The graphql function is used to parse GraphQL queries into a document that can be used by GraphQL clients.
 */
export function graphql(source: "\n  query Hypothesis($id: ID!) {\n    hypothesis(id: $id) {\n      id\n      name\n      description\n      preferred\n      version\n      author {\n        id\n        displayName\n      }\n      copiedFrom {\n        id\n        name\n      }\n      ties {\n        id\n        confidence\n        evidence\n        note\n        eventA {\n          id\n          name\n        }\n        eventB {\n          id\n          name\n        }\n      }\n      regionalEvents {\n        id\n        combinedMedianCalBp\n        concordance\n        concordanceThreshold\n        concordanceLow\n        warnings\n        ruptureLengthKm\n        members {\n          id\n          name\n        }\n        combinedHpd95 {\n          olderCalBp\n          youngerCalBp\n          probability\n        }\n        chiSquare {\n          t\n          df\n          critical5\n          passes\n        }\n        magnitude {\n          mw\n          sigma\n          relation\n        }\n      }\n      orderConflicts {\n        message\n        tieA {\n          id\n        }\n        tieB {\n          id\n        }\n        ties {\n          id\n        }\n        regionalEventIds\n      }\n    }\n  }\n"): typeof import('./graphql').HypothesisDocument;
/**
 * The graphql function is used to parse GraphQL queries into a document that can be used by GraphQL clients.
 */
export function graphql(source: "\n  mutation AddTie($input: AddTieInput!) {\n    addTie(input: $input) {\n      id\n    }\n  }\n"): typeof import('./graphql').AddTieDocument;
/**
 * The graphql function is used to parse GraphQL queries into a document that can be used by GraphQL clients.
 */
export function graphql(source: "\n  mutation RemoveTie($id: ID!) {\n    removeTie(id: $id)\n  }\n"): typeof import('./graphql').RemoveTieDocument;
/**
 * The graphql function is used to parse GraphQL queries into a document that can be used by GraphQL clients.
 */
export function graphql(source: "\n  mutation CreateHypothesis($input: CreateHypothesisInput!) {\n    createHypothesis(input: $input) {\n      id\n      name\n    }\n  }\n"): typeof import('./graphql').CreateHypothesisDocument;
/**
 * The graphql function is used to parse GraphQL queries into a document that can be used by GraphQL clients.
 */
export function graphql(source: "\n  mutation SetPreferredHypothesis($id: ID!) {\n    setPreferredHypothesis(id: $id) {\n      id\n      preferred\n    }\n  }\n"): typeof import('./graphql').SetPreferredHypothesisDocument;
/**
 * The graphql function is used to parse GraphQL queries into a document that can be used by GraphQL clients.
 */
export function graphql(source: "\n  mutation ImportSamples($input: ImportSamplesInput!) {\n    importSamples(input: $input) {\n      rowCount\n      committed\n      errors {\n        row\n        field\n        message\n      }\n      preview {\n        row\n        labCode\n        unitName\n        medianCalBp\n        hpd95 {\n          ...HpdRangeFields\n        }\n        warnings\n      }\n    }\n  }\n"): typeof import('./graphql').ImportSamplesDocument;
/**
 * The graphql function is used to parse GraphQL queries into a document that can be used by GraphQL clients.
 */
export function graphql(source: "\n  query Projects {\n    projects {\n      id\n      name\n      description\n      tectonicSetting\n      myRole\n      myPermissions\n    }\n  }\n"): typeof import('./graphql').ProjectsDocument;
/**
 * The graphql function is used to parse GraphQL queries into a document that can be used by GraphQL clients.
 */
export function graphql(source: "\n  query ProjectOverview($id: ID!) {\n    project(id: $id) {\n      id\n      name\n      description\n      tectonicSetting\n      myRole\n      myPermissions\n      segments {\n        id\n        version\n        name\n        startKm\n        endKm\n        notes\n      }\n      sites {\n        id\n        version\n        name\n        kind\n        latitude\n        longitude\n        alongStrikeKm\n        elevationM\n        waterDepthM\n        notes\n        segment {\n          id\n          name\n        }\n        eventHorizons {\n          id\n        }\n        samples {\n          id\n        }\n      }\n    }\n  }\n"): typeof import('./graphql').ProjectOverviewDocument;
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
export function graphql(source: "\n  query RecurrenceSetup($projectId: ID!) {\n    project(id: $projectId) {\n      id\n      name\n      myRole\n      myPermissions\n      segments {\n        id\n        name\n      }\n      sites {\n        id\n        name\n        kind\n      }\n      hypotheses {\n        id\n        name\n        preferred\n      }\n      preferredHypothesis {\n        id\n      }\n      recurrenceAnalyses {\n        id\n        status\n        createdAt\n        forecastStartYear\n        draws\n        segment {\n          id\n          name\n        }\n        site {\n          id\n          name\n        }\n        hypothesis {\n          id\n          name\n        }\n      }\n    }\n  }\n"): typeof import('./graphql').RecurrenceSetupDocument;
/**
 * The graphql function is used to parse GraphQL queries into a document that can be used by GraphQL clients.
 */
export function graphql(source: "\n  query RecurrenceAnalysis($id: ID!) {\n    recurrenceAnalysis(id: $id) {\n      id\n      status\n      progress\n      message\n      seed\n      forecastStartYear\n      windowsYears\n      draws\n      createdAt\n      finishedAt\n      hypothesisVersion\n      stale\n      staleReasons {\n        message\n        via\n      }\n      inputs {\n        ageModelRuns {\n          id\n          site {\n            id\n            name\n          }\n        }\n        hypothesisVersion\n      }\n      segment {\n        id\n        name\n      }\n      site {\n        id\n        name\n      }\n      hypothesis {\n        id\n        name\n      }\n      eventCount\n      lastEventMedianCalBp\n      openInterval {\n        median\n        low95\n        high95\n      }\n      intervals {\n        index\n        medianYears\n        low95\n        high95\n      }\n      meanRecurrence {\n        median\n        low95\n        high95\n      }\n      medianRecurrence {\n        median\n        low95\n        high95\n      }\n      sdRecurrence {\n        median\n        low95\n        high95\n      }\n      aperiodicity {\n        median\n        low95\n        high95\n      }\n      poisson {\n        windowYears\n        median\n        low95\n        high95\n      }\n      models {\n        model\n        aic\n        deltaAic\n        aicc\n        deltaAicc\n        akaikeWeight\n        meanRecurrenceYears\n        aperiodicity\n        logLikelihood\n        meanRecurrenceRange {\n          median\n          low95\n          high95\n          datingOnlyLow95\n          datingOnlyHigh95\n        }\n        aperiodicityRange {\n          median\n          low95\n          high95\n          datingOnlyLow95\n          datingOnlyHigh95\n        }\n        probabilities {\n          windowYears\n          median\n          low95\n          high95\n          datingOnlyLow95\n          datingOnlyHigh95\n        }\n      }\n      modelAveraged {\n        windowYears\n        median\n        low95\n        high95\n        datingOnlyLow95\n        datingOnlyHigh95\n      }\n      parameterNote\n      modelComparisonNote\n      curves {\n        model\n        density {\n          years\n          value\n        }\n        hazard {\n          years\n          value\n        }\n        survival {\n          years\n          value\n        }\n      }\n      histogram {\n        fromYears\n        toYears\n        count\n      }\n      caution\n    }\n  }\n"): typeof import('./graphql').RecurrenceAnalysisDocument;
/**
 * The graphql function is used to parse GraphQL queries into a document that can be used by GraphQL clients.
 */
export function graphql(source: "\n  mutation StartRecurrenceAnalysis($input: StartRecurrenceAnalysisInput!) {\n    startRecurrenceAnalysis(input: $input) {\n      id\n      status\n    }\n  }\n"): typeof import('./graphql').StartRecurrenceAnalysisDocument;
/**
 * The graphql function is used to parse GraphQL queries into a document that can be used by GraphQL clients.
 */
export function graphql(source: "\n  mutation CancelRecurrenceAnalysis($id: ID!) {\n    cancelRecurrenceAnalysis(id: $id) {\n      id\n      status\n    }\n  }\n"): typeof import('./graphql').CancelRecurrenceAnalysisDocument;
/**
 * The graphql function is used to parse GraphQL queries into a document that can be used by GraphQL clients.
 */
export function graphql(source: "\n  mutation RefreshStaleResults($projectId: ID!) {\n    refreshStaleResults(projectId: $projectId) {\n      id\n    }\n  }\n"): typeof import('./graphql').RefreshStaleResultsDocument;
/**
 * The graphql function is used to parse GraphQL queries into a document that can be used by GraphQL clients.
 */
export function graphql(source: "\n  query LatestRefresh($projectId: ID!) {\n    project(id: $projectId) {\n      id\n      refreshPlans {\n        id\n        status\n        createdAt\n        steps {\n          id\n          stage\n          label\n          status\n          message\n        }\n        skipped {\n          id\n          label\n          reason\n        }\n      }\n    }\n  }\n"): typeof import('./graphql').LatestRefreshDocument;
/**
 * The graphql function is used to parse GraphQL queries into a document that can be used by GraphQL clients.
 */
export function graphql(source: "\n  query ProjectReleases($id: ID!) {\n    project(id: $id) {\n      id\n      myRole\n      myPermissions\n      releases {\n        id\n        number\n        note\n        createdAt\n        createdBy {\n          id\n          displayName\n          email\n        }\n      }\n    }\n  }\n"): typeof import('./graphql').ProjectReleasesDocument;
/**
 * The graphql function is used to parse GraphQL queries into a document that can be used by GraphQL clients.
 */
export function graphql(source: "\n  query Release($id: ID!) {\n    release(id: $id) {\n      id\n      number\n      note\n      createdAt\n      createdBy {\n        id\n        displayName\n      }\n      segments {\n        id\n        name\n        startKm\n        endKm\n      }\n      sites {\n        id\n        name\n        kind\n        latitude\n        longitude\n        alongStrikeKm\n        segment {\n          id\n          name\n        }\n        units {\n          id\n        }\n        eventHorizons {\n          id\n        }\n        samples {\n          id\n        }\n      }\n    }\n  }\n"): typeof import('./graphql').ReleaseDocument;
/**
 * The graphql function is used to parse GraphQL queries into a document that can be used by GraphQL clients.
 */
export function graphql(source: "\n  query ReleaseDiff($fromId: ID!, $toId: ID!) {\n    releaseDiff(fromId: $fromId, toId: $toId) {\n      from {\n        id\n        number\n      }\n      to {\n        id\n        number\n      }\n      changes {\n        objectType\n        objectId\n        label\n        change\n      }\n    }\n  }\n"): typeof import('./graphql').ReleaseDiffDocument;
/**
 * The graphql function is used to parse GraphQL queries into a document that can be used by GraphQL clients.
 */
export function graphql(source: "\n  mutation CreateRelease($input: CreateReleaseInput!) {\n    createRelease(input: $input) {\n      id\n      number\n    }\n  }\n"): typeof import('./graphql').CreateReleaseDocument;
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
export function graphql(source: "\n  query Site($id: ID!) {\n    site(id: $id) {\n      id\n      version\n      name\n      kind\n      latitude\n      longitude\n      alongStrikeKm\n      elevationM\n      waterDepthM\n      notes\n      project {\n        id\n        name\n        myRole\n        myPermissions\n      }\n      segment {\n        id\n        name\n      }\n      units {\n        id\n        version\n        position\n        name\n        topDepthM\n        baseDepthM\n        facies\n        basalErosionM\n        notes\n      }\n      eventHorizons {\n        id\n        version\n        name\n        quality\n        evidence\n        notes\n        unitBelow {\n          id\n        }\n        unitAbove {\n          id\n        }\n      }\n      samples {\n        id\n        version\n        labCode\n        method\n        material\n        depthM\n        ageRelation\n        c14Age\n        c14Error\n        delta13C\n        curve\n        deltaR\n        deltaRError\n        calendarAgeBp\n        calendarErrorYears\n        measurementYear\n        excluded\n        exclusionReason\n        notes\n        unit {\n          id\n        }\n        calibrationError\n        calibration {\n          curve\n          medianCalBp\n          meanCalBp\n          sdYears\n          hpd68 {\n            ...HpdRangeFields\n          }\n          hpd95 {\n            ...HpdRangeFields\n          }\n          warnings\n        }\n      }\n    }\n  }\n"): typeof import('./graphql').SiteDocument;
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
/**
 * The graphql function is used to parse GraphQL queries into a document that can be used by GraphQL clients.
 */
export function graphql(source: "\n  mutation AcceptInvitation($input: AcceptInvitationInput!) {\n    acceptInvitation(input: $input) {\n      token\n      user {\n        id\n        email\n        displayName\n      }\n    }\n  }\n"): typeof import('./graphql').AcceptInvitationDocument;
/**
 * The graphql function is used to parse GraphQL queries into a document that can be used by GraphQL clients.
 */
export function graphql(source: "\n  mutation RequestPasswordReset($email: String!) {\n    requestPasswordReset(email: $email)\n  }\n"): typeof import('./graphql').RequestPasswordResetDocument;
/**
 * The graphql function is used to parse GraphQL queries into a document that can be used by GraphQL clients.
 */
export function graphql(source: "\n  mutation ResetPassword($input: ResetPasswordInput!) {\n    resetPassword(input: $input)\n  }\n"): typeof import('./graphql').ResetPasswordDocument;
/**
 * The graphql function is used to parse GraphQL queries into a document that can be used by GraphQL clients.
 */
export function graphql(source: "\n  query ProjectTeam($id: ID!) {\n    project(id: $id) {\n      id\n      name\n      myRole\n      myPermissions\n      members {\n        id\n        role\n        user {\n          id\n          email\n          displayName\n        }\n      }\n      invitations {\n        id\n        email\n        role\n        expiresAt\n        acceptedAt\n      }\n    }\n  }\n"): typeof import('./graphql').ProjectTeamDocument;
/**
 * The graphql function is used to parse GraphQL queries into a document that can be used by GraphQL clients.
 */
export function graphql(source: "\n  mutation InviteMember($input: InviteMemberInput!) {\n    inviteMember(input: $input) {\n      id\n      email\n      role\n      expiresAt\n    }\n  }\n"): typeof import('./graphql').InviteMemberDocument;
/**
 * The graphql function is used to parse GraphQL queries into a document that can be used by GraphQL clients.
 */
export function graphql(source: "\n  mutation SetMemberRole($input: SetMemberRoleInput!) {\n    setMemberRole(input: $input) {\n      id\n      role\n    }\n  }\n"): typeof import('./graphql').SetMemberRoleDocument;
/**
 * The graphql function is used to parse GraphQL queries into a document that can be used by GraphQL clients.
 */
export function graphql(source: "\n  mutation RemoveMember($projectId: ID!, $userId: ID!) {\n    removeMember(projectId: $projectId, userId: $userId)\n  }\n"): typeof import('./graphql').RemoveMemberDocument;
/**
 * The graphql function is used to parse GraphQL queries into a document that can be used by GraphQL clients.
 */
export function graphql(source: "\n  query InvitationLink($token: String!) {\n    invitationLink(token: $token) {\n      status\n      projectName\n    }\n  }\n"): typeof import('./graphql').InvitationLinkDocument;


export function graphql(source: string) {
  return (documents as any)[source] ?? {};
}
