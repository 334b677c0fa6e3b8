package org.tracewell.requirements;

import java.util.List;

/**
 * Machine requirements against axes: cell (r, c) holds the requirements derived from machine requirement r that are
 * allocated to axis c, and their worst status. Rows in model order, columns in axis order.
 *
 * @param rowRequirementIds machine-level requirement ids
 * @param rowStatuses       status of each machine requirement itself
 * @param columnAxisIds     axis model ids
 * @param columnAxisNames   axis names
 * @param cells             cells.get(row).get(column)
 */
public record ComplianceMatrix(List<String> rowRequirementIds, List<RequirementStatus> rowStatuses,
        List<String> columnAxisIds, List<String> columnAxisNames, List<List<Cell>> cells) {

    public ComplianceMatrix {
        rowRequirementIds = List.copyOf(rowRequirementIds);
        rowStatuses = List.copyOf(rowStatuses);
        columnAxisIds = List.copyOf(columnAxisIds);
        columnAxisNames = List.copyOf(columnAxisNames);
        cells = cells.stream().map(List::copyOf).toList();
    }

    public Cell cell(int row, int column) {
        return cells.get(row).get(column);
    }

    /**
     * @param requirementIds the allocated requirements in this cell (any depth below the row), empty when none
     * @param status         their worst status; {@code null} when the cell is empty
     */
    public record Cell(List<String> requirementIds, RequirementStatus status) {

        public Cell {
            requirementIds = List.copyOf(requirementIds);
        }

        public boolean isEmpty() {
            return requirementIds.isEmpty();
        }
    }
}
