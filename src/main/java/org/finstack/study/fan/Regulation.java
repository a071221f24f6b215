package org.finstack.study.fan;

/** How a generic fan came to its operating point. */
public enum Regulation {
    /** A fixed-speed fan, running where its curve meets the system curve. */
    FIXED_SPEED,
    /** A constant-airflow EC fan holding its set flow below its speed and power limits. */
    HOLDING_FLOW,
    /** A constant-airflow EC fan at its maximum speed: the flow has fallen below the set flow. */
    AT_MAX_SPEED,
    /** A constant-airflow EC fan held back by its maximum electrical power: the flow has fallen. */
    AT_MAX_POWER
}
