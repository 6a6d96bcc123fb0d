package org.fatefield.engine.lineage;

/**
 * The life of one cell, written when it divides or when the run ends.
 *
 * @param id             the cell's id
 * @param parentId       its mother's id, -1 for a founder
 * @param generation     divisions since its founder
 * @param birthTime      time of birth (h; founders were born before time 0)
 * @param divisionTime   time of division (h), NaN if alive at the end
 * @param birthX         position at birth (µm)
 * @param birthY         position at birth (µm)
 * @param birthZ         position at birth (µm), 0 in a flat tissue
 * @param fateAtDivision fate index when it divided, -1 if it did not
 * @param fateAtEnd      fate index at the end of the run, -1 if it divided
 * @param commitmentTime time its lineage last entered the cell's final fate (to the recording
 *                       interval; before its birth if it was born into the fate), NaN if unknown
 * @param deathTime      time it died (h), NaN if it did not
 * @param birthVolume    volume at birth, in mean newborn volumes
 * @param finalVolume    volume at division, death or the end of the run, in mean newborn volumes
 * @param firstEntryTime time (h) this cell itself first entered the timed fate
 *                       ({@code fates.first_passage}), NaN if it never did or none is timed
 */
public record LineageRecord(long id, long parentId, int generation, double birthTime, double divisionTime,
        double birthX, double birthY, double birthZ, int fateAtDivision, int fateAtEnd, double commitmentTime, double deathTime,
        double birthVolume, double finalVolume, double firstEntryTime) {
}
