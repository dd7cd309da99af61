/**
 * A moment in a view. The server hands JSON a Date and the client reads the ISO string it becomes, so every view
 * takes the moment's type as a parameter: handlers check `satisfies SomeView<Date>`, fetchers read `SomeView`.
 */
export type Moment = Date | string;
