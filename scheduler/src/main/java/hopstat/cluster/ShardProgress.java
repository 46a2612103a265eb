package hopstat.cluster;

/**
 * How far one shard is, from the journal alone.
 *
 * @param shard shard index
 * @param points grid points in the shard
 * @param finished realisations journaled (DONE or FAILED)
 * @param failed of those, FAILED
 * @param scheduled realisations the sampling rule asks for so far (final once complete)
 * @param complete true when the sampling rule asks for nothing more in this shard
 */
public record ShardProgress(
    int shard, int points, long finished, long failed, long scheduled, boolean complete) {}
