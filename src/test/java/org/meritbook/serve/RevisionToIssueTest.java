package org.meritbook.serve;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/** Which revision "Issue revision" publishes: never one already published, never a needless gap. */
class RevisionToIssueTest {
    @Test
    void theNotebooksRevisionWhenAheadElseTheOneAfterTheLatestPublished() {
        assertEquals(1, RevisionIssuer.revisionToIssue(1, 0), "a first issue is the notebook's revision 1");
        assertEquals(2, RevisionIssuer.revisionToIssue(1, 1), "revision 1 is published: the next is 2");
        assertEquals(3, RevisionIssuer.revisionToIssue(3, 1), "raised by hand to 3: issued as 3");
        assertEquals(5, RevisionIssuer.revisionToIssue(2, 4), "behind the published ones: after the latest");
    }
}
