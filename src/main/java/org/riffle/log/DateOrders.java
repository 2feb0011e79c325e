package org.riffle.log;

import java.util.List;

/**
 * Settles the order of day and month in dates written with the year last. Dots mean day first (the
 * convention wherever dots are used). Otherwise the user's {@code --day-first} or {@code --month-first}
 * decides; without it, day first is taken only when the file shows a first field above 12, and month
 * first never silently: a file that reads only month first, or either way, is refused with a message
 * naming the option that settles it.
 *
 * <p>Stateless and thread-safe.
 */
final class DateOrders {
    private DateOrders() {
    }

    static Stamps.Order settle(String file, TimeSniffer.Stats s, ReadOptions opt, List<String> notes)
            throws LogException {
        int n = s.filled();
        boolean dmy = TimeSniffer.most(s.dmy(), n);
        boolean mdy = TimeSniffer.most(s.mdy(), n);
        String like = "dates like '" + s.example() + "'";
        if (opt.dateOrder().isPresent()) {
            boolean dayFirst = opt.dateOrder().get() == ReadOptions.DateOrder.DAY_FIRST;
            if (dayFirst ? !dmy : !mdy) {
                throw new LogException(file, s.exampleLine(), 0, like + " do not read "
                        + (dayFirst ? "day first (--day-first)" : "month first (--month-first)"));
            }
            return dayFirst ? Stamps.Order.DMY : Stamps.Order.MDY;
        }
        boolean dotted = s.example().matches("\\d{1,2}\\.\\d{1,2}\\..*");
        if (dmy && !mdy) {
            if (!dotted) {
                notes.add(like + " read day first: a first field above 12 settles it");
            }
            return Stamps.Order.DMY;
        }
        if (mdy && !dmy) {
            throw new LogException(file, s.exampleLine(), 0, like + " read only month first; say so with"
                    + " --month-first");
        }
        throw new LogException(file, s.exampleLine(), 0, like + " can be day first or month first;"
                + " give --day-first or --month-first");
    }
}
